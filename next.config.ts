import path from 'node:path';
import type { NextConfig } from 'next';
import { SECURITY_HEADERS } from './server/security/csp';

const root = path.resolve(__dirname);

const nextConfig: NextConfig = {
  // Separate build folders let a second dev server (e.g. for e2e) run beside the first.
  distDir: process.env.NEXT_DIST_DIR ?? '.next',
  // PGlite ships ~15 MB of wasm: keep it out of the bundle (STACK.md).
  serverExternalPackages: ['@electric-sql/pglite', 'pg', 'smtp-server', 'mailparser', 'nodemailer', '@node-rs/argon2'],
  turbopack: { root },
  outputFileTracingRoot: root,
  // Runtime data and other build folders are never part of the server bundle.
  // The plan sheet reads its faces at run time (server/api/sheet-fonts.ts).
  outputFileTracingIncludes: { '/api/layouts/[id]/sheet': ['./fonts/*.woff'] },
  outputFileTracingExcludes: { '*': ['data/**', '.next-*/**', 'artifacts/**', 'test-results/**'] },
  poweredByHeader: false,
  // `npm test` type-checks the whole project (tests included) as its own first step; the build need not repeat it.
  typescript: { ignoreBuildErrors: true },
  typedRoutes: false,
  async headers() {
    return [
      { source: '/:path*', headers: SECURITY_HEADERS },
      // Viewer links and invitations (app/v, app/api/v, app/invite): never indexed, and the token in
      // the address never leaks through a Referer header. Later entries override the same key.
      ...['/v/:path*', '/api/v/:path*', '/invite/:path*'].map((source) => ({
        source,
        headers: [
          { key: 'X-Robots-Tag', value: 'noindex, nofollow' },
          { key: 'Referrer-Policy', value: 'no-referrer' },
          { key: 'Cache-Control', value: 'no-store, private' },
        ],
      })),
    ];
  },
};

export default nextConfig;
