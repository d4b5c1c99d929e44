import path from 'node:path';
import type { NextConfig } from 'next';
import { SECURITY_HEADERS } from './lib/security/csp';

const root = path.resolve(__dirname);

const nextConfig: NextConfig = {
  // Separate build folders let a second dev server (e.g. for e2e) run beside the first.
  distDir: process.env.NEXT_DIST_DIR ?? '.next',
  // PGlite ships ~15 MB of wasm: keep it out of the bundle (STACK.md).
  serverExternalPackages: ['@electric-sql/pglite', 'pg', 'smtp-server', 'mailparser', 'nodemailer', '@node-rs/argon2'],
  turbopack: { root },
  outputFileTracingRoot: root,
  poweredByHeader: false,
  typedRoutes: false,
  async headers() {
    return [{ source: '/:path*', headers: SECURITY_HEADERS }];
  },
};

export default nextConfig;
