import type { DataSource } from 'typeorm';
import type { LocalFolderStorage } from '../adapters/storage.js';
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

/**
 * Makes the photo folder agree with the rows: every file a row claims is published, every file
 * no row claims goes. Only files last changed before `before` are touched: at start that is the
 * moment the process started (no upload of this process is running yet); on the periodic run a
 * time well past any upload in progress, so a file another process is still staging is left alone.
 */
export async function sweepPhotoStorage(deps: {
  dataSource: DataSource;
  storage: LocalFolderStorage;
  before: Date;
  logger: Logger;
}): Promise<PhotoSweepReport> {
  const { storage, before } = deps;
  const report: PhotoSweepReport = { published: 0, orphans: 0, pending: 0, strays: 0 };
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
      await storage.removeStray(entry.path);
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
