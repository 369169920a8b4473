import { photoUploadFields } from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import {
  ImageRejectedError,
  processPhotoFile,
  type ImageRejection,
  type ProcessedPhoto,
} from '../adapters/images.js';
import { createStorage, newStorageKey, type StorageAdapter, type StoredObject } from '../adapters/storage.js';
import type { Config } from '../config.js';
import type { ConditionPhoto } from '../entities/condition-photo.entity.js';
import { AppError, conflict, forbidden, notFound, validationFailed } from '../errors.js';
import { futureEntryProblem } from '../lib/local-time.js';
import { whileStaging } from '../lib/staging-lock.js';
import type { Logger } from '../logger.js';
import type { UploadedFile } from '../middleware/upload.js';
import { isDatabaseUnavailable, zodFields } from '../middleware/errors.js';
import { presentPhoto, type PhotoView } from '../presenters/photo.presenter.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';
import {
  PhotoRepository,
  type NewConditionPhoto,
  type PhotoFilter,
} from '../repositories/photo.repository.js';
import { findTeamPose } from './pose.service.js';

type PhotoDeps = {
  dataSource: DataSource;
  config: Pick<Config, 'photoStorage' | 'uploadsDir' | 's3'>;
  logger: Logger;
  /** Defaults to the uploads folder; tests pass their own to provoke failures. */
  storage?: StorageAdapter;
};

const REJECTION_CODES: Record<
  ImageRejection,
  'unsupported_media_type' | 'validation_failed' | 'payload_too_large'
> = {
  unsupported_type: 'unsupported_media_type',
  unreadable: 'validation_failed',
  too_many_pixels: 'payload_too_large',
};

/** The client's file name, made safe to repeat in a message. */
function displayName(name: string, index: number): string {
  const clean = name
    .replace(/[\u0000-\u001f\u007f"]/g, '')
    .trim()
    .slice(0, 80);
  return clean ? `"${clean}"` : `Photo ${index + 1}`;
}

function isUniqueViolation(error: unknown): boolean {
  const e = error as { code?: string; driverError?: { code?: string } } | null;
  return e?.code === '23505' || e?.driverError?.code === '23505';
}

/**
 * The photos of one day, presented, for the day view (GET /days/:date). Pass the caller's
 * manager (or the data source's) — it only reads.
 */
export async function listDayPhotos(
  manager: EntityManager,
  athleteId: string,
  date: string,
): Promise<PhotoView[]> {
  return (await new PhotoRepository(manager).listForDay(athleteId, date)).map(presentPhoto);
}

/** date → photo count for day summaries over a range (GET /days?from&to). */
export function countPhotosByDay(
  manager: EntityManager,
  athleteId: string,
  from: string,
  to: string,
): Promise<Map<string, number>> {
  return new PhotoRepository(manager).countByDay(athleteId, from, to);
}

export class PhotoService {
  private readonly storage: StorageAdapter;

  constructor(private readonly deps: PhotoDeps) {
    this.storage = deps.storage ?? createStorage(deps.config);
  }

  /**
   * Stores uploaded photos of `athlete` (the caller has authorized `log` and checked consent).
   * Every file is checked and re-encoded first; then all sizes are staged; then the rows, in one
   * transaction; then the files are published. Any failure before the commit removes the staged
   * files and leaves no row. A file whose
   * bytes are already stored for that day and pose comes back as the existing photo.
   */
  async upload(
    athlete: AthleteWithPeople,
    body: unknown,
    files: readonly UploadedFile[],
    now: Date,
  ): Promise<PhotoView[]> {
    const { manager } = this.deps.dataSource;
    const parsed = photoUploadFields.safeParse(body ?? {});
    const fields: Record<string, string> = parsed.success ? {} : zodFields(parsed.error).fields;
    if (files.length === 0) fields.files = 'Choose at least one photo.';
    // The same rule as every entry's date: the athlete's today at the latest, within the history window.
    const dateProblem = parsed.success
      ? futureEntryProblem({ date: parsed.data.date }, athlete.user.timeZone, now)
      : null;
    if (dateProblem && 'date' in dateProblem) fields.date = dateProblem.date;
    let pose: string | null = null;
    if (parsed.success) {
      pose = await findTeamPose(manager, athlete.teamId, parsed.data.pose);
      if (pose === null) fields.pose = 'Choose a pose from the list';
    }
    if (!parsed.success || Object.keys(fields).length > 0 || pose === null) throw validationFailed(fields);
    const date = parsed.data.date;

    // 1. Check and re-encode every file before anything is written.
    const processed: ProcessedPhoto[] = [];
    for (const [index, file] of files.entries()) {
      try {
        processed.push(await processPhotoFile(file.path));
      } catch (error) {
        if (!(error instanceof ImageRejectedError)) throw error;
        const message = `${displayName(file.originalName, index)} ${error.message}`;
        throw new AppError(REJECTION_CODES[error.reason], message, { files: message });
      }
    }

    // 2. A repeat of bytes already stored (a retried upload) reuses the first photo.
    const repo = new PhotoRepository(manager);
    const existing = new Map(
      (
        await repo.findExisting(athlete.id, date, pose, [...new Set(processed.map((p) => p.contentHash))])
      ).map((row) => [row.contentHash, row]),
    );
    const fresh = new Map<string, ProcessedPhoto>();
    for (const photo of processed) {
      if (!existing.has(photo.contentHash) && !fresh.has(photo.contentHash))
        fresh.set(photo.contentHash, photo);
    }

    // 3. Stage every size (pending names), 4. commit the rows, 5. publish the files. A kill before
    // the commit leaves pending files no row claims; after it, rows whose files the start sweep
    // publishes (`sweepPhotoStorage`). A refused commit removes what was staged.
    // The staging lock (held shared from the first staged file to the commit, on the committing
    // connection) keeps another instance's start sweep from taking these files for a dead upload's.
    const staged: string[] = [];
    const rows: NewConditionPhoto[] = [];
    await whileStaging(this.deps.dataSource, async (lockHolder) => {
      try {
        for (const photo of fresh.values()) {
          const thumbKey = newStorageKey(athlete.id, photo.thumb.contentType);
          await this.storage.stage(thumbKey, photo.thumb.data, photo.thumb.contentType);
          staged.push(thumbKey);
          const displayKey = newStorageKey(athlete.id, photo.display.contentType);
          await this.storage.stage(displayKey, photo.display.data, photo.display.contentType);
          staged.push(displayKey);
          rows.push({
            athleteId: athlete.id,
            localDate: date,
            pose,
            width: photo.display.width,
            height: photo.display.height,
            thumbKey,
            displayKey,
            contentType: photo.display.contentType,
            bytes: photo.thumb.data.length + photo.display.data.length,
            contentHash: photo.contentHash,
          });
        }
        const inserted = await lockHolder.transaction((tx) => new PhotoRepository(tx).insertMany(rows));
        for (const row of inserted) existing.set(row.contentHash, row);
      } catch (error) {
        // A lost connection may have lost the COMMIT's answer, not the commit: the sweep decides
        // from the rows. Any other failure means no row, so the staged files go now.
        if (!isDatabaseUnavailable(error)) await this.removeKeys(staged);
        if (isUniqueViolation(error)) {
          throw conflict('These photos are being uploaded already. Refresh the gallery to see them.');
        }
        throw error;
      }
    });
    for (const key of staged) await this.storage.publish(key);

    return processed.map((p) => presentPhoto(existing.get(p.contentHash)!));
  }

  async list(athleteId: string, filter: PhotoFilter): Promise<PhotoView[]> {
    return (await new PhotoRepository(this.deps.dataSource.manager).list(athleteId, filter)).map(
      presentPhoto,
    );
  }

  /** Opens a stored size; a row whose file has gone missing answers 404 (and is logged). */
  async open(
    photo: ConditionPhoto,
    size: 'thumb' | 'display',
  ): Promise<StoredObject & { contentType: string }> {
    const key = size === 'thumb' ? photo.thumbKey : photo.displayKey;
    const object = await this.storage.get(key);
    if (!object) {
      this.deps.logger.warn({ photoId: photo.id, size }, 'photo file missing from storage');
      throw notFound();
    }
    return { ...object, contentType: photo.contentType };
  }

  /** Deletes the row, then its files (a file left behind is only wasted space, and is logged). */
  async delete(photo: ConditionPhoto): Promise<void> {
    await new PhotoRepository(this.deps.dataSource.manager).delete(photo.id);
    await this.removeKeys([photo.thumbKey, photo.displayKey]);
  }

  private async removeKeys(keys: readonly string[]): Promise<void> {
    const results = await Promise.allSettled(keys.map((key) => this.storage.delete(key)));
    results.forEach((result, i) => {
      if (result.status === 'rejected') {
        this.deps.logger.error({ err: result.reason, key: keys[i] }, 'could not remove a stored photo file');
      }
    });
  }
}

/** Consent gate for uploads: stored photos need the athlete's photo consent. */
export function assertPhotoConsent(athlete: { photoConsent: boolean }): void {
  if (!athlete.photoConsent) {
    throw forbidden(
      'Photo uploads are off because photo consent has not been given. You can give it in your profile (intake form).',
    );
  }
}
