// `npm run demo`: build if needed, migrate and seed the demo folder, serve the production build
// on http://localhost:3000 and print the demo sign-ins. Safe to run again.
import { spawn } from 'node:child_process';
import { buildIfNeeded } from './lib/build';
import { seedDatabase } from './lib/test-server';

const port = process.env.PORT ?? '3000';
buildIfNeeded();
seedDatabase('demo');
console.log(`\nBaywright demo: http://localhost:${port}  (Ctrl+C to stop)\n`);
const child = spawn('npx', ['next', 'start', '-p', port], {
  stdio: 'inherit',
  env: { ...process.env, BAYWRIGHT_DB: 'demo', BAYWRIGHT_DEMO: '1', NODE_ENV: 'production', NEXT_TELEMETRY_DISABLED: '1' },
});
const forward = (signal: NodeJS.Signals) => child.kill(signal);
process.on('SIGINT', forward);
process.on('SIGTERM', forward);
child.on('exit', (code) => process.exit(code ?? 0));
