import type { EntityManager } from '@mikro-orm/sqlite';

/** Requeued once, then failed: the message a twice-interrupted run gets. */
export const INTERRUPTED_TWICE_MESSAGE = 'interrupted twice by server restarts — retry when the server is stable';

type Row = Record<string, unknown>;

async function sqlAll(em: EntityManager, sql: string, params: unknown[]): Promise<Row[]> {
  return (await em.getConnection().execute(sql, params, 'all')) as Row[];
}

/**
 * Claims the oldest queued run for a runner with ONE statement, so runners in several processes
 * sharing the database never take the same row: the inner select and the status check run inside
 * the same write (SQLite serialises writers).
 *
 * @param em entity manager
 * @param runnerId the claiming runner instance
 * @returns the claimed surface id, or null when nothing is queued
 * @example
 * const id = await surfaceClaimNext(em, runner.id);
 */
export async function surfaceClaimNext(em: EntityManager, runnerId: string): Promise<string | null> {
  const now = Date.now();
  const rows = await sqlAll(
    em,
    "update `surfaces` set `status` = 'running', `claimed_by` = ?, `started_at` = ?, `heartbeat_at` = ?, `updated_at` = ?, `progress` = 0, `attempts` = `attempts` + 1 " +
      "where `id` = (select `id` from `surfaces` where `status` = 'queued' order by `queued_at`, `id` limit 1) and `status` = 'queued' returning `id`",
    [runnerId, now, now, now],
  );
  return rows.length > 0 ? String(rows[0].id) : null;
}

/**
 * Marks a runner's running rows alive and reports the current status of the rows it works on, so a
 * run cancelled elsewhere (another process, the API) is noticed.
 *
 * @param em entity manager
 * @param runnerId the runner
 * @param ids runs this runner has workers for
 * @returns id → { status, claimedBy } for those ids
 * @example
 * const seen = await surfaceHeartbeat(em, runner.id, [...workers.keys()]);
 */
export async function surfaceHeartbeat(em: EntityManager, runnerId: string, ids: string[]): Promise<Map<string, { status: string; claimedBy: string | null }>> {
  const now = Date.now();
  await sqlAll(em, "update `surfaces` set `heartbeat_at` = ? where `claimed_by` = ? and `status` = 'running'", [now, runnerId]);
  const seen = new Map<string, { status: string; claimedBy: string | null }>();
  if (ids.length === 0) return seen;
  const rows = await sqlAll(em, `select \`id\`, \`status\`, \`claimed_by\` from \`surfaces\` where \`id\` in (${ids.map(() => '?').join(', ')})`, ids);
  for (const r of rows) seen.set(String(r.id), { status: String(r.status), claimedBy: (r.claimed_by as string | null) ?? null });
  return seen;
}

/**
 * Crash recovery: running rows whose runner stopped beating before `staleBefore` (its process is
 * gone) go back to the queue once (attempts < 2); a second interruption fails them with a reason.
 *
 * @param em entity manager
 * @param staleBefore epoch ms; heartbeats older than this are dead
 * @returns the requeued and the failed ids
 * @example
 * await surfaceRecoverStale(em, Date.now() - 30_000);
 */
export async function surfaceRecoverStale(em: EntityManager, staleBefore: number): Promise<{ requeued: string[]; failed: string[] }> {
  const now = Date.now();
  const requeued = await sqlAll(
    em,
    "update `surfaces` set `status` = 'queued', `claimed_by` = null, `heartbeat_at` = null, `progress` = 0, `updated_at` = ? " +
      "where `status` = 'running' and (`heartbeat_at` is null or `heartbeat_at` < ?) and `attempts` < 2 returning `id`",
    [now, staleBefore],
  );
  const error = JSON.stringify({ code: 'INTERRUPTED', message: INTERRUPTED_TWICE_MESSAGE });
  const failed = await sqlAll(
    em,
    "update `surfaces` set `status` = 'failed', `claimed_by` = null, `finished_at` = ?, `updated_at` = ?, `error` = ? " +
      "where `status` = 'running' and (`heartbeat_at` is null or `heartbeat_at` < ?) and `attempts` >= 2 returning `id`",
    [now, now, error, staleBefore],
  );
  return { requeued: requeued.map((r) => String(r.id)), failed: failed.map((r) => String(r.id)) };
}

/**
 * Puts a runner's own running rows back in the queue on a graceful stop (not counted as an attempt).
 *
 * @param em entity manager
 * @param runnerId the stopping runner
 * @returns the requeued ids
 * @example
 * await surfaceRequeueOwn(em, runner.id);
 */
export async function surfaceRequeueOwn(em: EntityManager, runnerId: string): Promise<string[]> {
  const rows = await sqlAll(
    em,
    "update `surfaces` set `status` = 'queued', `claimed_by` = null, `heartbeat_at` = null, `progress` = 0, `attempts` = max(`attempts` - 1, 0), `updated_at` = ? " +
      "where `status` = 'running' and `claimed_by` = ? returning `id`",
    [Date.now(), runnerId],
  );
  return rows.map((r) => String(r.id));
}
