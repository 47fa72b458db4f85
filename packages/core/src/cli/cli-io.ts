/** Where the CLI writes: the real streams in production, buffers in tests. */
export interface CliIo {
  out(text: string): void;
  err(text: string): void;
  /** True when stderr is a terminal (progress then redraws one line). */
  errIsTty: boolean;
  /** Milliseconds since some fixed moment, for timings and progress throttling. */
  now(): number;
}

/** The process's own stdout/stderr. */
export const processIo: CliIo = {
  out: (t) => void process.stdout.write(t),
  err: (t) => void process.stderr.write(t),
  errIsTty: process.stderr.isTTY === true,
  now: () => performance.now(),
};

/**
 * A progress reporter for long runs: prints "label … 42 %" on stderr, at most every 5 points,
 * and only once the run has taken more than half a second (short runs stay quiet).
 *
 * @param io output streams
 * @param label what is running
 * @returns `update(fraction)` and `done()`
 * @example
 * const p = progressReporter(processIo, 'computing the surface');
 * p.update(0.5); p.done();
 */
export function progressReporter(io: CliIo, label: string): { update(fraction: number): void; done(): void } {
  const start = io.now();
  let shown = -1;
  return {
    update(fraction) {
      const pct = Math.floor(Math.min(1, Math.max(0, fraction)) * 100);
      if (io.now() - start < 500 || pct < shown + 5) return;
      shown = pct;
      io.err(io.errIsTty ? `\r${label} … ${pct} %` : `${label} … ${pct} %\n`);
    },
    done() {
      if (shown >= 0 && io.errIsTty) io.err(`\r${label} … 100 %\n`);
    },
  };
}
