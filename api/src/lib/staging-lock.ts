import type { DataSource, EntityManager } from 'typeorm';

/**
 * One PostgreSQL advisory lock key (a number of our own choosing, common practice, no source) that
 * keeps the photo start sweep and uploads in other instances apart. An upload holds it shared from
 * before it stages its files until its rows commit, on the connection that commits them; the start
 * sweep holds it exclusively. While the sweep holds it, no upload anywhere is between staging and
 * commit, so a pending file no row claims belongs to a process that died. A process that dies lets
 * go of the lock with its connection.
 */
export const PHOTO_STAGING_LOCK = 0x44_4d_50_53; // "DMPS"

/**
 * Holds the staging lock (`shared` or exclusive) on one connection while `work` runs, and lets go of
 * it before the connection goes back to the pool.
 */
async function holdingLock<T>(
  dataSource: DataSource,
  mode: 'shared' | 'exclusive',
  work: (manager: EntityManager) => Promise<T>,
): Promise<T> {
  const suffix = mode === 'shared' ? '_shared' : '';
  const runner = dataSource.createQueryRunner();
  try {
    await runner.query(`SELECT pg_advisory_lock${suffix}($1)`, [PHOTO_STAGING_LOCK]);
    try {
      return await work(runner.manager);
    } finally {
      // A lost connection has let go already; ending the session is what matters.
      await runner
        .query(`SELECT pg_advisory_unlock${suffix}($1)`, [PHOTO_STAGING_LOCK])
        .catch(() => undefined);
    }
  } finally {
    await runner.release();
  }
}

/**
 * Runs `work` with the staging lock held shared, on one connection: `work` gets that connection's
 * manager and must commit its rows through it (`manager.transaction(…)`), so the rows cannot
 * commit after the lock is gone.
 */
export function whileStaging<T>(
  dataSource: DataSource,
  work: (manager: EntityManager) => Promise<T>,
): Promise<T> {
  return holdingLock(dataSource, 'shared', work);
}

/** Runs `work` while no upload in any instance is between staging and commit (the start sweep). */
export function withStagingPaused<T>(dataSource: DataSource, work: () => Promise<T>): Promise<T> {
  return holdingLock(dataSource, 'exclusive', () => work());
}
