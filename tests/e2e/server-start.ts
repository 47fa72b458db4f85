import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { freePort } from './free-port.js';

const repoRoot = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');
const serverEntry = join(repoRoot, 'apps', 'server', 'dist', 'server.js');
const webIndex = join(repoRoot, 'apps', 'web', 'dist', 'index.html');

export type RunningServer = {
  baseUrl: string;
  /** Everything the server printed, for failure messages. */
  output: () => string;
  stop: () => Promise<void>;
};

async function healthWait(baseUrl: string, child: ChildProcess, output: () => string, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      throw new Error(`The Demandscape server exited with code ${child.exitCode} before answering. Its output:\n${output()}`);
    }
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`The Demandscape server did not answer /api/health within ${timeoutMs / 1000} s. Its output:\n${output()}`);
}

/**
 * Starts the built server (apps/server/dist) with the built web app on free ports, a temporary
 * data folder, mail captured in memory and the local Google sign-in stand-in.
 * @param options the identity the Google stand-in signs in as; `demoSeed` adds the demo organization
 * @returns the base URL and a `stop` that ends the process and deletes the data folder
 * @example const server = await serverStart({ googleEmail: 'maren@larchloaf.test', googleName: 'Maren Larchwood' });
 */
export async function serverStart(options: {
  googleEmail: string;
  googleName: string;
  /** Add the invented Larchloaf demo organization, users (one per role) and credits. */
  demoSeed?: boolean;
  /** More environment for the server (e.g. free ports for the payment and mail stand-ins); wins over the defaults. */
  env?: Record<string, string>;
}): Promise<RunningServer> {
  for (const [file, what] of [
    [serverEntry, 'the server'],
    [webIndex, 'the web app'],
  ] as const) {
    if (!existsSync(file)) {
      throw new Error(`${file} is missing: build ${what} first with \`npm run build\` at the repository root (turbo builds it before this test).`);
    }
  }
  const [port, oauthPort] = [await freePort(), await freePort()];
  const dataDir = mkdtempSync(join(tmpdir(), 'demandscape-e2e-'));
  const baseUrl = `http://localhost:${port}`;
  let log = '';
  const child = spawn(process.execPath, [serverEntry], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: 'development',
      PORT: String(port),
      HOST: '127.0.0.1',
      PUBLIC_URL: baseUrl,
      DATA_DIR: dataDir,
      START_STANDINS: 'true',
      DEMO_SEED: options.demoSeed ? 'true' : 'false',
      // These specs start from the demo people and credits only (no demo customer file or surface).
      DEMO_CUSTOMERS: 'false',
      MAIL_TRANSPORT: 'capture',
      OAUTH_FAKE_PORT: String(oauthPort),
      OAUTH_FAKE_EMAIL: options.googleEmail,
      OAUTH_FAKE_NAME: options.googleName,
      OAUTH_FAKE_SUBJECT: 'fake-google-e2e-0001',
      LOG_LEVEL: 'warn',
      ...options.env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (log += chunk.toString()));
  const output = () => log;
  const stop = async () => {
    if (child.exitCode === null) {
      const exited = new Promise((r) => child.once('exit', r));
      child.kill('SIGTERM');
      await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
      if (child.exitCode === null) child.kill('SIGKILL');
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await healthWait(baseUrl, child, output, 90_000);
  } catch (error) {
    await stop();
    throw error;
  }
  return { baseUrl, output, stop };
}
