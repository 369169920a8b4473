import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Athlete } from './athlete.entity.js';
import { BaseRecord } from './base.entity.js';

/**
 * One condition photo of an athlete: the re-encoded sizes live in the storage adapter under
 * random keys (never a public path); this row is written only after every size is stored.
 */
@Entity({ name: 'condition_photos' })
@Index('IDX_condition_photos_athlete_id_local_date', ['athleteId', 'localDate'])
// A retried upload of the same bytes for the same day and pose returns the first row.
@Index(
  'UQ_condition_photos_athlete_id_local_date_pose_content_hash',
  ['athleteId', 'localDate', 'pose', 'contentHash'],
  {
    unique: true,
  },
)
export class ConditionPhoto extends BaseRecord {
  @Column({ name: 'athlete_id', type: 'uuid' })
  athleteId: string;

  @ManyToOne(() => Athlete, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'athlete_id', foreignKeyConstraintName: 'FK_condition_photos_athlete_id' })
  athlete?: Athlete;

  /** The athlete's local calendar date the photo belongs to (YYYY-MM-DD). */
  @Column({ name: 'local_date', type: 'date' })
  localDate: string;

  /** A pose name from the team's list at upload time (kept as text if the list changes later). */
  @Column({ type: 'varchar', length: 60 })
  pose: string;

  /** Pixel size of the stored display image, after the EXIF orientation was applied. */
  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  /** Storage key of the small size (about 320 px on the long edge). */
  @Column({ name: 'thumb_key', type: 'varchar', length: 200 })
  thumbKey: string;

  /** Storage key of the display size (about 1600 px on the long edge). */
  @Column({ name: 'display_key', type: 'varchar', length: 200 })
  displayKey: string;

  /** MIME type of both stored sizes. */
  @Column({ name: 'content_type', type: 'varchar', length: 40 })
  contentType: string;

  /** Bytes stored for this photo (both sizes together). */
  @Column({ type: 'integer' })
  bytes: number;

  /** SHA-256 (hex) of the uploaded file, to recognise a repeated upload. */
  @Column({ name: 'content_hash', type: 'char', length: 64 })
  contentHash: string;
}
