import type { MikroORM } from '@mikro-orm/sqlite';
import { customerFileImport } from './customer-file-import.js';

/**
 * Runs imports in the background of this process and lets `close` wait for them.
 */
export class ImportRunner {
  private readonly running = new Set<Promise<void>>();

  /**
   * @param orm - the ORM
   * @param uploadsDir - UPLOADS_DIR
   */
  constructor(
    private readonly orm: MikroORM,
    private readonly uploadsDir: string,
  ) {}

  /**
   * Starts one import after the current request has been answered.
   * @param fileId - a file marked importing
   * @returns the import's promise
   */
  start(fileId: string): Promise<void> {
    const job = new Promise<void>((resolve) => setImmediate(resolve))
      .then(() => customerFileImport(this.orm, fileId, this.uploadsDir))
      .finally(() => this.running.delete(job));
    this.running.add(job);
    return job;
  }

  /** @returns resolves when no import is running */
  async idle(): Promise<void> {
    while (this.running.size > 0) await Promise.allSettled([...this.running]);
  }
}
