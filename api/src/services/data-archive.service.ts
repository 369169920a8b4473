import type { Readable } from 'node:stream';
import type { DataSource, EntityManager } from 'typeorm';
import { ZipFile } from 'yazl';
import { createStorage, type StorageAdapter } from '../adapters/storage.js';
import type { Config } from '../config.js';
import type { Logger } from '../logger.js';
import { athleteProfileView } from './plan.service.js';
import type { AthleteWithPeople } from '../repositories/athlete.repository.js';

/** The athlete's own tables, each read whole (`athlete_id = $1`), grouped into the archive's files. */
const ARCHIVE_TABLES = {
  'days.json': [
    'weigh_ins',
    'fluid_entries',
    'meal_entries',
    'meal_entry_items',
    'supplement_entries',
    'evening_logs',
    'symptom_reports',
  ],
  'plans.json': ['plan_versions', 'guardrail_acknowledgements'],
  'weekly-check-ins.json': ['weekly_check_ins'],
  'flags.json': ['athlete_flags'],
  'body-composition.json': ['body_measurements'],
  'making-weight.json': ['cut_plans', 'cut_rehearsal_notes'],
} as const;

type Row = Record<string, unknown>;

async function rowsOf(manager: EntityManager, table: string, athleteId: string): Promise<Row[]> {
  // Table names come from the constants here, never from a request. row_to_json keeps dates as
  // "YYYY-MM-DD" and instants as ISO strings (the driver would turn dates into local midnights).
  const rows = await manager.query<{ r: Row }[]>(
    `SELECT row_to_json(t) AS r FROM "${table}" t WHERE t.athlete_id = $1 ORDER BY t.created_at, t.id`,
    [athleteId],
  );
  return rows.map((row) => row.r);
}

const json = (value: unknown) => Buffer.from(JSON.stringify(value, null, 2) + '\n', 'utf8');

type ArchiveDeps = {
  dataSource: DataSource;
  config: Config;
  logger: Logger;
  clock: () => Date;
  storage?: StorageAdapter;
};

/**
 * The athlete's data archive: a zip of JSON files (profile, days with every entry, plans, marks
 * with their replies, weekly check-ins, flags, body-composition measurements, cut plans and rehearsal notes, photos) and the photo files themselves under
 * `photos/`. Built in memory of the rows, streamed out as the zip is written.
 */
export class DataArchiveService {
  private readonly storage: StorageAdapter;

  constructor(private readonly deps: ArchiveDeps) {
    this.storage = deps.storage ?? createStorage(deps.config);
  }

  async build(athlete: AthleteWithPeople): Promise<Readable> {
    const manager = this.deps.dataSource.manager;
    const zip = new ZipFile();
    const mtime = this.deps.clock();

    const consents = (
      await manager.query<{ r: Row }[]>(
        'SELECT row_to_json(c) AS r FROM consents c WHERE c.user_id = $1 ORDER BY c.accepted_at, c.id',
        [athlete.userId],
      )
    ).map((row) => row.r);
    zip.addBuffer(
      json({
        exportedAt: mtime.toISOString(),
        consents,
        profile: await athleteProfileView(manager, athlete, mtime),
        user: {
          name: athlete.user.name,
          email: athlete.user.email,
          timeZone: athlete.user.timeZone,
          weightUnit: athlete.user.weightUnit,
          volumeUnit: athlete.user.volumeUnit,
        },
      }),
      'profile.json',
      { mtime },
    );
    for (const [file, tables] of Object.entries(ARCHIVE_TABLES)) {
      const content: Record<string, Row[]> = {};
      for (const table of tables) content[table] = await rowsOf(manager, table, athlete.id);
      zip.addBuffer(json(content), file, { mtime });
    }

    const marks = await rowsOf(manager, 'marks', athlete.id);
    const replies = (
      await manager.query<{ r: Row }[]>(
        `SELECT row_to_json(r) AS r FROM mark_replies r JOIN marks m ON m.id = r.mark_id
          WHERE m.athlete_id = $1 ORDER BY r.created_at, r.id`,
        [athlete.id],
      )
    ).map((row) => row.r);
    zip.addBuffer(json({ marks, mark_replies: replies }), 'marks.json', { mtime });

    const photos = await rowsOf(manager, 'condition_photos', athlete.id);
    const listed: Row[] = [];
    for (const photo of photos) {
      const key = String(photo.display_key);
      const ext = key.split('.').pop() ?? 'jpg';
      const name = `photos/${String(photo.local_date)}-${String(photo.id)}.${ext}`;
      const object = await this.storage.get(key);
      if (object) {
        const chunks: Buffer[] = [];
        for await (const chunk of object.stream) chunks.push(Buffer.from(chunk as Buffer));
        zip.addBuffer(Buffer.concat(chunks), name, { mtime, compress: false });
        listed.push({ ...photo, file: name });
      } else {
        this.deps.logger.warn({ photoId: photo.id }, 'photo file missing from storage during export');
        listed.push({ ...photo, file: null });
      }
    }
    zip.addBuffer(json({ condition_photos: listed }), 'photos.json', { mtime });
    zip.end();
    return zip.outputStream as Readable;
  }
}
