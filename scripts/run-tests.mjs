#!/usr/bin/env node
// Runs every package's tests through Turborepo, streams the output, then prints one closing
// line that adds up the Vitest summaries of all packages ("tests: N passed, N failed").
import { spawn } from 'node:child_process';

const ANSI = /\u001b\[[0-9;]*m/g;
const child = spawn('npx', ['turbo', 'run', 'test', '--concurrency=1', ...process.argv.slice(2)], {
  stdio: ['ignore', 'pipe', 'pipe'],
});

let passed = 0;
let failed = 0;
let skipped = 0;
let pending = '';

function scan(text) {
  pending += text;
  const lines = pending.split('\n');
  pending = lines.pop() ?? '';
  for (const raw of lines) tally(raw);
}

function tally(raw) {
  const line = raw.replace(ANSI, '');
  // Vitest: " Tests  2 failed | 26 passed | 1 skipped (29)" (after turbo's "pkg:test: " prefix)
  const m = line.match(/(?:^|:\s)\s*Tests\s+(.+)\(\d+\)\s*$/);
  if (!m) return;
  for (const part of m[1].split('|')) {
    const p = part.trim().match(/^(\d+)\s+(passed|failed|skipped|todo)/);
    if (!p) continue;
    const n = Number(p[1]);
    if (p[2] === 'passed') passed += n;
    else if (p[2] === 'failed') failed += n;
    else skipped += n;
  }
}

child.stdout.on('data', (d) => {
  process.stdout.write(d);
  scan(d.toString());
});
child.stderr.on('data', (d) => {
  process.stderr.write(d);
  scan(d.toString());
});
child.on('close', (code) => {
  if (pending) tally(pending);
  const status = code === 0 ? 0 : code || 1;
  if (status !== 0 && failed === 0) failed = 1; // a package failed outside a test (build, setup)
  console.log(`\ntests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
  process.exit(status);
});
