import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import type { ConsentKind } from '@driftmark/shared';
import { BaseRecord } from './base.entity.js';
import { User } from './user.entity.js';

/** One answer to one version of a consent text (append-only: a new answer is a new row). */
@Entity({ name: 'consents' })
@Check('CHK_consents_kind', `"kind" IN ('safety_acknowledgement', 'photo_consent')`)
export class Consent extends BaseRecord {
  @Index('IDX_consents_user_id')
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'user_id', foreignKeyConstraintName: 'FK_consents_user_id' })
  user?: User;

  @Column({ type: 'varchar', length: 40 })
  kind: ConsentKind;

  /** CONSENTS[kind].version at the time of the answer. */
  @Column({ type: 'varchar', length: 20 })
  version: string;

  @Column({ type: 'boolean' })
  granted: boolean;

  @Column({ name: 'accepted_at', type: 'timestamptz' })
  acceptedAt: Date;
}
