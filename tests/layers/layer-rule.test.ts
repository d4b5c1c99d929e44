// The layer rule (eslint.config.mjs, DEVELOPERS.md "Layers"): every import runs down the layers.
// Each case lints one line of source as if it stood at the given path, through ESLint's own Node
// API and the project's config, and says whether the fence fires. A fence that silently stopped
// matching (a renamed folder, a pattern typo) fails here, not in review.
import fs from 'node:fs';
import path from 'node:path';
import { ESLint } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

const RULE = '@typescript-eslint/no-restricted-imports';
const ROOT = path.resolve(import.meta.dirname, '../..');
let eslint: ESLint;

beforeAll(() => {
  eslint = new ESLint({ cwd: ROOT });
});

/** The layer-rule messages ESLint gives `source` placed at `file` (a path that need not exist). */
async function fences(file: string, source: string): Promise<string[]> {
  const [result] = await eslint.lintText(`${source}\nexport {};\n`, { filePath: file });
  return result.messages.filter((m) => m.ruleId === RULE).map((m) => m.message);
}

describe('imports that run back up the layers are refused', () => {
  it.each([
    // The pure domain: nothing of the database, the services, the UI or the framework.
    ['lib/checks/probe.ts', "import { getLayout } from '@/db/layouts';", /does not reach the database/],
    ['lib/checks/probe.ts', "import { getDb } from '../../db/client';", /does not reach the database/],
    ['lib/planning/probe.ts', "import { handle } from '@/server/api/respond';", /services \(server\/\)/],
    ['lib/layout/probe.ts', "import { useState } from 'react';", /pure: no react/],
    ['lib/sheet/probe.ts', "import { headers } from 'next/headers';", /pure: no React, Konva/],
    ['lib/tracing/probe.ts', "import { log } from '@/lib/log';", /pure: no logger/],
    ['lib/cache/probe.ts', "import fs from 'node:fs';", /pure: no logger, threads, files/],
    ['lib/format.ts', "import { Toaster } from 'sonner';", /pure: no sonner/],
    ['lib/symbols/probe.ts', "import { Button } from '@/components/ui/Button';", /React components/],
    ['lib/geometry/probe.ts', "import { bayTemplate } from '@/lib/layout';", /imports nothing of ours/],
    // The rest of lib/: no database, no services either.
    ['lib/uploads/probe.ts', "import { getDb } from '@/db/client';", /does not reach the database/],
    // The editor's pure core.
    ['components/editor/store/probe.ts', "import { Stage } from 'react-konva';", /pure: no react-konva/],
    ['components/editor/geometry/probe.ts', "import { useStore } from 'zustand';", /pure: no zustand/],
    ['components/editor/commands/probe.ts', "import { toast } from 'sonner';", /pure: no sonner/],
    ['components/editor/store/probe.ts', "import { PlanCanvas } from '../canvas/PlanCanvas';", /drawing, panels or data hooks/],
    // The toast library only through its on-demand adapter (components/ui/toast.ts).
    ['components/planning/Probe.tsx', "import { toast } from 'sonner';", /components\/ui\/toast/],
    ['app/(app)/probe/page.tsx', "import { Toaster } from 'sonner';", /components\/ui\/toast/],
    // Components: types from db/ and server/ only.
    ['components/planning/Probe.tsx', "import { getCurrentQuote } from '@/db/quotes';", /types only/],
    ['components/planning/Probe.tsx', "import { sendMail } from '@/server/mail/transport';", /services \(server\/\)/],
    ['components/planning/Probe.tsx', "import Page from '@/app/(app)/layouts/page';", /pages or route handlers/],
    // db/ sits below the services and the app.
    ['db/probe.ts', "import { actorFromRequest } from '@/server/auth/session';", /services \(server\/\)/],
    ['db/sharing/probe.ts', "import { handle } from '../../server/api/respond';", /services \(server\/\)/],
    ['db/probe.ts', "import * as route from '@/app/api/layouts/route';", /pages or route handlers/],
    // server/ sits below the app.
    ['server/mail/probe.ts', "import * as route from '@/app/api/layouts/route';", /pages or route handlers/],
    // A page takes nothing from a route folder.
    ['app/(app)/layouts/[id]/probe/page.tsx', "import { guardViewer } from '@/app/api/v/viewer-guard';", /route folder/],
    ['app/(app)/layouts/probe/page.tsx', "import { x } from '../../../api/layouts/helper';", /route folder/],
    // The fakes: only through the switch.
    ['server/mail/probe.ts', "import { startFakeSmtpOnce } from '@/dev/fakes/smtp/server';", /local fakes/],
    ['app/api/probe/route.ts', "import { startFakeSmtpOnce } from '@/dev/fakes/smtp/server';", /local fakes/],
    ['instrumentation-probe.ts', "import { startLocalServices } from './dev/fakes/local-services';", /local fakes/],
    ['lib/layout/probe.ts', "import { x } from '@/dev/fakes/stripe';", /local fakes/],
  ])('%s: %s', async (file, source, message) => {
    const found = await fences(file, source);
    expect(found).toHaveLength(1);
    expect(found[0]).toMatch(message);
  });
});

describe('imports that run down the layers pass', () => {
  it.each([
    ['lib/checks/probe.ts', "import { unionArea } from '@/lib/geometry';"],
    ['lib/geometry/probe.ts', "import { x } from './rect';"],
    ['lib/sheet/probe.ts', "import { runChecks } from '../checks';"],
    ['components/editor/store/probe.ts', "import { createStore } from 'zustand/vanilla';"],
    ['components/editor/commands/useProbe.ts', "import { useEffect } from 'react';"],
    ['components/planning/Probe.tsx', "import type { QuoteDto } from '@/db/quotes';"],
    ['components/planning/Probe.tsx', "import { useQuery } from '@tanstack/react-query';"],
    ['components/planning/Probe.tsx', "import { toast } from '@/components/ui/toast';"],
    ['components/ui/Probe.tsx', "import type { ToasterProps } from 'sonner';"],
    ['db/probe.ts', "import { hashPassword } from '../lib/auth/password';"],
    ['server/api/probe.ts', "import { loadActor } from '@/db/actor';"],
    ['server/api/probe.ts', "import { NextResponse } from 'next/server';"],
    ['app/api/probe/route.ts', "import { handle } from '@/server/api/respond';"],
    ['app/(app)/probe/page.tsx', "import { getLayout } from '@/db/layouts';"],
    ['server/local-mode.ts', "import { startLocalServices } from '@/dev/fakes/local-services';"],
  ])('%s: %s', async (file, source) => {
    expect(await fences(file, source)).toEqual([]);
  });
});

describe('the local fakes', () => {
  // ESLint's import rule does not see `import('…')`, so the production tree is read as text too.
  const PRODUCTION = ['app', 'components', 'db', 'lib', 'server'];
  const SWITCH = 'server/local-mode.ts';
  function sources(dir: string): string[] {
    const full = path.join(ROOT, dir);
    if (!fs.existsSync(full)) return [];
    return fs.readdirSync(full, { recursive: true, encoding: 'utf8' })
      .filter((f) => /\.(ts|tsx|mts|mjs)$/.test(f))
      .map((f) => path.join(dir, f));
  }
  it('are named by no production file but the one switch, not even in a dynamic import', () => {
    const files = [...PRODUCTION.flatMap(sources), ...fs.readdirSync(ROOT).filter((f) => /\.(ts|mts)$/.test(f))];
    expect(files.length).toBeGreaterThan(100);
    const naming = files.filter((f) => f !== SWITCH && /['"`](@\/|(\.\.?\/)+)dev\/fakes\//.test(fs.readFileSync(path.join(ROOT, f), 'utf8')));
    expect(naming).toEqual([]);
  });
});
