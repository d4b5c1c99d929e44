// `npm test`: everything a change must pass, as CI runs it (.ci/run) — the typecheck, the lint,
// the vitest suites (tests/*), the production build, the system tests against `next start`
// (tests/system) and the browser tests in Chromium (tests/e2e).
//
// On a 2-core machine most of these steps use one core, so they run side by side where they
// can: each step starts as soon as the steps it needs have passed. The build waits for the
// typecheck (`next build` writes .next/types, which the typecheck reads); the browser tests wait
// for the build and the vitest suites (they measure nothing, but their timeouts should not
// compete with two vitest workers). Output lines carry their step's name; the first failure
// stops the other steps. The times of each step go to artifacts/test-times.json.
import fs from 'node:fs';
import path from 'node:path';
import { spawn, type ChildProcess } from 'node:child_process';

interface Step {
  name: string;
  cmd: string[];
  after: string[];
  env?: Record<string, string>;
}

const tsx = ['npx', 'tsx', '--conditions=react-server'];
const STEPS: Step[] = [
  { name: 'typecheck', cmd: ['npx', 'tsc', '--noEmit'], after: [] },
  { name: 'lint', cmd: ['npx', 'eslint', '--max-warnings=0', '.'], after: [] },
  { name: 'vitest', cmd: ['npx', 'vitest', 'run'], after: [] },
  { name: 'build', cmd: [...tsx, 'scripts/e2e.ts', '--only=build'], after: ['typecheck'] },
  { name: 'system', cmd: [...tsx, 'scripts/e2e.ts', '--only=system'], after: ['build'] },
  { name: 'browser', cmd: [...tsx, 'scripts/e2e.ts', '--only=browser'], after: ['build', 'vitest'] },
];

// `npm test -- --steps=typecheck,lint` runs only those steps (what they wait for counts as passed).
const chosen = process.argv.find((a) => a.startsWith('--steps='))?.slice('--steps='.length).split(',');
if (chosen) {
  const unknown = chosen.filter((c) => !STEPS.some((s) => s.name === c));
  if (unknown.length) {
    console.error(`No such step: ${unknown.join(', ')}. Steps: ${STEPS.map((s) => s.name).join(', ')}`);
    process.exit(2);
  }
  STEPS.splice(0, STEPS.length, ...STEPS.filter((s) => chosen.includes(s.name)).map((s) => ({ ...s, after: s.after.filter((a) => chosen.includes(a)) })));
}

type State = { status: 'waiting' | 'running' | 'passed' | 'failed' | 'stopped'; started?: number; ended?: number; child?: ChildProcess };
const state = new Map<string, State>(STEPS.map((s) => [s.name, { status: 'waiting' }]));
const width = Math.max(...STEPS.map((s) => s.name.length));
const began = Date.now();
let failed = false;

function prefixLines(name: string, stream: NodeJS.ReadableStream, out: NodeJS.WriteStream) {
  let rest = '';
  stream.on('data', (chunk: Buffer) => {
    const lines = (rest + chunk.toString()).split('\n');
    rest = lines.pop() ?? '';
    for (const line of lines) out.write(`[${name.padEnd(width)}] ${line}\n`);
  });
  stream.on('end', () => rest && out.write(`[${name.padEnd(width)}] ${rest}\n`));
}

function start(step: Step) {
  const s = state.get(step.name)!;
  s.status = 'running';
  s.started = Date.now();
  console.log(`[${step.name.padEnd(width)}] ▶ ${step.cmd.slice(1).join(' ')}`);
  const child = spawn(step.cmd[0], step.cmd.slice(1), {
    env: { ...process.env, FORCE_COLOR: process.env.FORCE_COLOR ?? '1', ...step.env },
    stdio: ['ignore', 'pipe', 'pipe'],
    detached: true, // its own process group, so a failure elsewhere can stop all of it
  });
  s.child = child;
  prefixLines(step.name, child.stdout!, process.stdout);
  prefixLines(step.name, child.stderr!, process.stderr);
  child.on('exit', (code, signal) => {
    s.ended = Date.now();
    s.child = undefined;
    if (s.status === 'stopped') return settle();
    s.status = code === 0 ? 'passed' : 'failed';
    const took = ((s.ended - s.started!) / 1000).toFixed(0);
    console.log(`[${step.name.padEnd(width)}] ${s.status === 'passed' ? '✔ passed' : `✘ failed (${signal ?? `exit ${code}`})`} in ${took} s`);
    if (s.status === 'failed' && !failed) {
      failed = true;
      stopOthers();
    }
    settle();
  });
}

function stopOthers() {
  for (const [name, s] of state) {
    if (s.status === 'waiting') s.status = 'stopped';
    if (s.status === 'running' && s.child?.pid) {
      s.status = 'stopped';
      console.log(`[${name.padEnd(width)}] ■ stopped: another step failed`);
      try {
        process.kill(-s.child.pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
  }
}

function settle() {
  if (!failed) {
    for (const step of STEPS) {
      const s = state.get(step.name)!;
      if (s.status === 'waiting' && step.after.every((a) => state.get(a)!.status === 'passed')) start(step);
    }
  }
  if ([...state.values()].some((s) => s.child || (s.status === 'waiting' && !failed))) return;
  report();
}

function report() {
  const total = (Date.now() - began) / 1000;
  const rows = STEPS.map((step) => {
    const s = state.get(step.name)!;
    const seconds = s.started && s.ended ? Math.round((s.ended - s.started) / 100) / 10 : null;
    const from = s.started ? Math.round((s.started - began) / 100) / 10 : null;
    return { step: step.name, status: s.status, startedAtS: from, seconds };
  });
  console.log('\nnpm test');
  for (const r of rows) console.log(`  ${r.step.padEnd(width)}  ${r.status.padEnd(7)}  ${r.seconds === null ? '' : `${r.seconds} s (from ${r.startedAtS} s)`}`);
  console.log(`  ${'total'.padEnd(width)}  ${failed ? 'failed ' : 'passed '}  ${total.toFixed(0)} s`);
  try {
    fs.mkdirSync('artifacts', { recursive: true });
    fs.writeFileSync(path.join('artifacts', 'test-times.json'), JSON.stringify({ at: new Date().toISOString(), totalS: Math.round(total), passed: !failed, steps: rows }, null, 2) + '\n');
  } catch {
    /* the times are a convenience */
  }
  process.exit(failed ? 1 : 0);
}

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.once(signal, () => {
    failed = true;
    stopOthers();
    process.exit(130);
  });
}

settle();
