import type { DataSource } from 'typeorm';
import { OWNER_MARK, type SweepableStorage } from '../adapters/storage.js';
import type { Logger } from '../logger.js';
import { PhotoRepository } from '../repositories/photo.repository.js';

export interface PhotoSweepReport {
  /** Pending files a committed row claims: published now (the kill came after the commit). */
  published: number;
  /** Published files no row claims (a kill between a row's delete and its files'): removed. */
  orphans: number;
  /** Pending files no row claims (a kill before the commit): removed. */
  pending: number;
  /** Files that are not ours by name (e.g. `*.tmp` of an older version): removed. */
  strays: number;
}

const BATCH = 500;

/** The file (or object) in the photo store naming the database whose rows the files belong to. */
export { OWNER_MARK };

/** A database named by host, port and name (no credentials): what the folder's mark holds. */
export function databaseIdentity(databaseUrl: string): string {
  const url = new URL(databaseUrl);
  return `${url.hostname}:${url.port || '5432'}${url.pathname}`;
}

/**
 * Whether the store belongs to this database: a store without a mark is marked now; a store
 * marked for another database (a server pointed at the wrong folder or bucket) is never swept.
 */
async function ownsStorage(storage: SweepableStorage, identity: string): Promise<boolean> {
  const mark = await storage.readMark();
  if (mark !== null) return mark.trim() === identity;
  await storage.writeMark(`${identity}\n`);
  return (await storage.readMark())?.trim() === identity;
}

/**
 * Makes the photo store (folder or bucket) agree with the rows: every file a row claims is published, every file
 * no row claims goes. Only files last changed before `before` are touched: at start that is the
 * moment the process started (no upload of this process is running yet); on the periodic run a
 * time well past any upload in progress, so a file another process is still staging is left alone.
 */
export async function sweepPhotoStorage(deps: {
  dataSource: DataSource;
  storage: SweepableStorage;
  /** `databaseIdentity(DATABASE_URL)`: the store is swept only when it is marked for it. */
  database: string;
  before: Date;
  logger: Logger;
}): Promise<PhotoSweepReport> {
  const { storage, before } = deps;
  const report: PhotoSweepReport = { published: 0, orphans: 0, pending: 0, strays: 0 };
  if (!(await ownsStorage(storage, deps.database))) {
    deps.logger.warn(
      { photoStorage: storage.location, database: deps.database },
      `the photo store is marked for another database (${OWNER_MARK}); not swept`,
    );
    return report;
  }
  const repo = new PhotoRepository(deps.dataSource.manager);

  let batch: { key: string; pending: boolean }[] = [];
  const settle = async () => {
    const claimed = await repo.claimedKeys([...new Set(batch.map((b) => b.key))]);
    for (const { key, pending } of batch) {
      if (claimed.has(key)) {
        if (pending) {
          await storage.publish(key);
          report.published += 1;
        }
      } else {
        await storage.delete(key);
        report[pending ? 'pending' : 'orphans'] += 1;
      }
    }
    batch = [];
  };

  for await (const entry of storage.list()) {
    if (entry.modifiedAt >= before) continue;
    if (entry.key === null) {
      await storage.removeStray(entry.name);
      report.strays += 1;
      continue;
    }
    batch.push({ key: entry.key, pending: entry.pending });
    if (batch.length >= BATCH) await settle();
  }
  if (batch.length > 0) await settle();

  if (report.published + report.orphans + report.pending + report.strays > 0)
    deps.logger.warn({ ...report }, 'photo storage swept');
  return report;
}
