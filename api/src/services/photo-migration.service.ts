import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import type { DataSource } from 'typeorm';
import { contentTypeOfKey, type StorageAdapter } from '../adapters/storage.js';
import { PhotoRepository } from '../repositories/photo.repository.js';

/** What a migration run did, object by object (each photo has two: thumb and display). */
export interface PhotoMigrationReport {
  /** Objects the photo rows name. */
  objects: number;
  /** Written to the destination and read back with the source's hash. */
  copied: number;
  /** Of `copied`: the destination held other bytes (a copy cut off by a kill), now replaced. */
  replaced: number;
  /** The destination already held the same bytes (an earlier run): left as it was. */
  alreadyThere: number;
  /** Removed from the source after the destination was verified (`removeSource`). */
  removedFromSource: number;
  /** In neither store: a row whose file was lost before the migration (logged by key). */
  missing: string[];
}

/** The destination's bytes differ from the source's after a copy: the run stops there. */
export class PhotoMigrationError extends Error {}

const PAGE = 200;

function sha256(data: Buffer): string {
  return createHash('sha256').update(data).digest('hex');
}

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}

async function bytesOf(storage: StorageAdapter, key: string): Promise<Buffer | null> {
  const object = await storage.get(key);
  return object ? readAll(object.stream) : null;
}

/**
 * Copies every stored photo file the rows name from one store to the other (the folder and the
 * bucket, either way), verified by SHA-256: an object is done when the destination's bytes hash
 * like the source's. Resumable: a run cut off anywhere (a kill, Ctrl-C via `signal`) is finished by
 * running it again, which skips what is already there and verified and rewrites what is not.
 * With `removeSource`, a source object is removed only after its copy was verified; a later run
 * then finds it in the destination alone and counts it as already there.
 */
export async function migratePhotos(deps: {
  dataSource: DataSource;
  from: StorageAdapter;
  to: StorageAdapter;
  removeSource?: boolean;
  /** Stops between objects when aborted (the report so far is returned). */
  signal?: AbortSignal;
  /** Called after each object, with the report so far (progress lines). */
  onObject?: (report: PhotoMigrationReport) => void;
}): Promise<PhotoMigrationReport> {
  const { from, to } = deps;
  const report: PhotoMigrationReport = {
    objects: 0,
    copied: 0,
    replaced: 0,
    alreadyThere: 0,
    removedFromSource: 0,
    missing: [],
  };
  const repo = new PhotoRepository(deps.dataSource.manager);

  const migrate = async (key: string): Promise<void> => {
    report.objects += 1;
    const source = await bytesOf(from, key);
    if (source === null) {
      // Moved by an earlier run that removed the source, or lost before.
      if (await to.exists(key)) report.alreadyThere += 1;
      else report.missing.push(key);
      return;
    }
    const hash = sha256(source);
    const present = await bytesOf(to, key);
    if (present !== null && sha256(present) === hash) {
      report.alreadyThere += 1;
    } else {
      // Other bytes, or a staged copy a killed run left: start this object afresh.
      if (present !== null) report.replaced += 1;
      await to.delete(key);
      await to.put(key, source, contentTypeOfKey(key));
      const written = await bytesOf(to, key);
      if (written === null || sha256(written) !== hash) {
        throw new PhotoMigrationError(`${key}: the copy does not hash like the source (sha256 ${hash})`);
      }
      report.copied += 1;
    }
    if (deps.removeSource) {
      await from.delete(key);
      report.removedFromSource += 1;
    }
  };

  let after: string | null = null;
  for (;;) {
    const page = await repo.keysPage(after, PAGE);
    for (const photo of page) {
      for (const key of [photo.thumbKey, photo.displayKey]) {
        if (deps.signal?.aborted) return report;
        await migrate(key);
        deps.onObject?.(report);
      }
    }
    if (page.length < PAGE) return report;
    after = page[page.length - 1]!.id;
  }
}

/** The report as the command prints it. */
export function formatMigrationReport(report: PhotoMigrationReport, direction: string): string[] {
  const lines = [
    `Photo files ${direction}: ${report.objects} named by the rows; ${report.copied} copied and verified (sha256)` +
      `${report.replaced > 0 ? `, ${report.replaced} of them replacing different bytes` : ''}; ` +
      `${report.alreadyThere} already there and verified; ${report.missing.length} missing in both stores` +
      `${report.removedFromSource > 0 ? `; ${report.removedFromSource} removed from the source` : ''}.`,
  ];
  for (const key of report.missing) lines.push(`  missing: ${key}`);
  return lines;
}
