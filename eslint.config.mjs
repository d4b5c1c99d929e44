// Next's own rules, plus the layer rule (DEVELOPERS.md, "Layers"): every import runs down the layers,
//
//   app ─► server ─► db ─► lib            components ─► lib   (types only from db and server)
//
// the pure domain in lib/ and the editor's pure core import nothing of the UI, the framework, the
// database or the services, and the local fakes (dev/fakes) are reached only through the one switch,
// server/local-mode.ts. tests/layers/layer-rule.test.ts proves each fence fires.
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

const RULE = '@typescript-eslint/no-restricted-imports';

/** Where each layer lives. */
const PURE = ['lib/geometry', 'lib/layout', 'lib/checks', 'lib/planning', 'lib/proposals', 'lib/sheet', 'lib/symbols', 'lib/tracing', 'lib/cache'];
const PURE_FILES = ['lib/format.ts', 'lib/look.ts'];
/** The editor's pure core: geometry, commands, store logic, edits and history (hooks `use*.ts` and `.tsx` are UI). */
const EDITOR_CORE = ['components/editor/geometry', 'components/editor/commands', 'components/editor/store'];
const LOCAL_MODE_SWITCH = 'server/local-mode.ts';

const TS = ['ts', 'tsx', 'mts', 'cts'];
const under = (dirs) => dirs.flatMap((d) => TS.map((x) => `${d}/**/*.${x}`));

/** Import patterns of each layer, as written with the `@/` alias or relatively. */
const DB = ['@/db', '@/db/*', '**/db/*', 'drizzle-orm', 'drizzle-orm/*', '@electric-sql/*', 'pg'];
const SERVER = ['@/server/*', '**/server/*', '!next/server', '!react-dom/server'];
const APP = ['@/app/*', '**/app/*'];
const COMPONENTS = ['@/components/*', '**/components/*'];
const FAKES = ['@/dev/*', '**/dev/*'];
const UI_PATHS = ['react', 'react-dom', 'konva', 'react-konva', 'zustand', 'next', 'sonner', 'server-only', 'lucide-react'];
const UI_PATTERNS = ['next/*', 'react/*', 'react-dom/*', 'konva/*', 'react-konva/*', '@tanstack/*', 'next-auth', 'next-auth/*'];

const fence = (message, group, allowTypeImports = false) => ({ group, message, allowTypeImports });
const NO_DB = (who) => fence(`${who} does not reach the database: take what you need as arguments, or move this code down to db/ or up to server/.`, DB);
const NO_SERVER = (who, types = false) => fence(`${who} does not use the server's services (server/)${types ? '; a type is fine' : ''}: they sit above it.`, SERVER, types);
const NO_APP = (who) => fence(`${who} does not import pages or route handlers (app/): they are the top layer.`, APP);
const NO_COMPONENTS = (who) => fence(`${who} does not import React components (components/).`, COMPONENTS);
const NO_FAKES = (who) => fence(`${who} never imports the local fakes (dev/fakes): production reaches them only through ${LOCAL_MODE_SWITCH}.`, FAKES);
/** The server-side leaves of lib/: they open no database, but they are not pure either. */
const LEAVES = ['@/lib/log', '@/lib/log/*', '**/log', '@/lib/workers/*', '**/workers/*', '@/lib/backup/*', '**/backup/*', '**/data-root', '**/uploads/store', '**/uploads/limits', 'node:*', 'server-only'];
const NO_LEAVES = (who) => fence(`${who} is pure: no logger, threads, files or other server-side leaves.`, LEAVES);
const NO_UI = (who) => fence(`${who} is pure: no React, Konva, stores, toasts, Next or icons.`, UI_PATTERNS);
/** The toast library is loaded on demand by one adapter; a static import would put it back in first loads. */
const NO_TOAST_LIBRARY = fence("Show toasts with `toast` from '@/components/ui/toast', which loads the toast library when it is first needed (a type is fine).", ['sonner', 'sonner/*'], true);
const uiPaths = (who, except = []) => UI_PATHS.filter((n) => !except.includes(n)).map((name) => ({ name, message: `${who} is pure: no ${name}.` }));

const layer = (name, files, ignores, paths, patterns) => ({ name: `layers/${name}`, files, ignores, rules: { [RULE]: ['error', { paths, patterns }] } });

const layers = [
  layer('pure domain: lib/geometry', under(['lib/geometry']), [], uiPaths('lib/geometry'), [
    NO_UI('lib/geometry'), NO_LEAVES('lib/geometry'), NO_DB('lib/geometry'), NO_SERVER('lib/geometry'), NO_APP('lib/geometry'), NO_COMPONENTS('lib/geometry'), NO_FAKES('lib/geometry'),
    fence('lib/geometry imports nothing of ours: plain numbers in, plain numbers out.', ['@/lib/*', '../*', '!../geometry/*']),
  ]),
  layer('pure domain', [...under(PURE.filter((d) => d !== 'lib/geometry')), ...PURE_FILES], [], uiPaths('The pure domain'), [
    NO_UI('The pure domain'), NO_LEAVES('The pure domain'), NO_DB('The pure domain'), NO_SERVER('The pure domain'), NO_APP('The pure domain'), NO_COMPONENTS('The pure domain'), NO_FAKES('The pure domain'),
  ]),
  layer('lib', under(['lib']), [...under(PURE), ...PURE_FILES], [], [NO_DB('lib/'), NO_SERVER('lib/'), NO_APP('lib/'), NO_COMPONENTS('lib/'), NO_FAKES('lib/')]),
  layer('editor core', EDITOR_CORE.map((d) => `${d}/**/*.ts`), ['**/use*.ts'], uiPaths('The editor core'), [
    // The store is zustand's framework-free core; the React binding lives in EditorStoreContext.tsx.
    fence('The editor core is pure: no React, Konva, toasts, Next or icons (zustand/vanilla is fine).', [...UI_PATTERNS, 'zustand/*', '!zustand/vanilla']),
    NO_LEAVES('The editor core'), NO_DB('The editor core'), NO_SERVER('The editor core'), NO_APP('The editor core'), NO_FAKES('The editor core'),
    fence('The editor core does not import the editor\'s drawing, panels or data hooks.', ['**/canvas/*', '**/panels/*', '**/section/*', '**/editor/api/*', '../api/*', '**/Editor', '**/EditorLoader']),
  ]),
  layer('components', under(['components']), [...EDITOR_CORE.map((d) => `${d}/**/*.ts`), '!**/use*.ts'], [], [
    fence('Components run in the browser: from db/ take types only (the DTOs), never code.', DB.slice(0, 3), true),
    NO_SERVER('Components', true), NO_APP('Components'), NO_FAKES('Components'), NO_TOAST_LIBRARY,
  ]),
  layer('db', under(['db']), [], [], [NO_SERVER('db/'), NO_APP('db/'), NO_COMPONENTS('db/'), NO_FAKES('db/')]),
  layer('server', under(['server']), [LOCAL_MODE_SWITCH], [], [NO_APP('server/'), NO_COMPONENTS('server/'), NO_FAKES('server/')]),
  layer('the local-mode switch', [LOCAL_MODE_SWITCH], [], [], [NO_APP('The switch'), NO_COMPONENTS('The switch')]),
  layer('app screens', under(['app']), under(['app/api']), [], [
    NO_FAKES('app/'), NO_TOAST_LIBRARY,
    { regex: '^(@/app/api/|(\\.\\./)+api/)', message: 'A page does not import from a route folder (app/api): put what both need in server/ (or lib/ when it is pure).' },
  ]),
  layer('route handlers', under(['app/api']), [], [], [NO_FAKES('A route handler'), NO_COMPONENTS('A route handler')]),
  layer('start-up and config', ['*.ts', '*.mts'], [], [], [NO_FAKES('Start-up code'), NO_COMPONENTS('Start-up code')]),
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: ['.next/**', '.next-*/**', 'bench/results.json', 'node_modules/**', 'data/**', 'drizzle/**', 'test-results/**', 'playwright-report/**', 'artifacts/**', 'next-env.d.ts'],
  },
  ...layers,
  {
    // Server code logs through lib/log, which cuts out tokens, hashes and query parameters.
    files: ['app/**/*.ts', 'lib/**/*.ts', 'server/**/*.ts', 'dev/**/*.ts', 'db/**/*.ts', 'auth.ts', 'auth.config.ts', 'proxy.ts', 'instrumentation*.ts'],
    ignores: ['dev/fakes/stripe/run.ts'],
    rules: { 'no-console': 'error' },
  },
  {
    // Tests poke at untyped JSON bodies on purpose.
    files: ['tests/**/*.ts', 'tests/**/*.tsx'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // TanStack Table and react-hook-form are the stack's choices; the compiler simply skips memoising those components.
      'react-hooks/incompatible-library': 'off',
    },
  },
];

export default config;
