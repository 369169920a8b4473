import type { TemplateDay } from '@driftmark/shared';
import { Check, Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { BaseRecord } from './base.entity.js';
import type { EventType } from './athlete.entity.js';
import { Team } from './team.entity.js';
import { User } from './user.entity.js';

/** A team's countdown template: days counted from the event (E-7 … E+1), each with targets. */
@Entity({ name: 'countdown_templates' })
@Check('CHK_countdown_templates_event_type', `"event_type" IN ('show', 'shoot', 'weigh_in', 'none')`)
export class CountdownTemplate extends BaseRecord {
  @Index('IDX_countdown_templates_team_id')
  @Column({ name: 'team_id', type: 'uuid' })
  teamId: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE', nullable: false })
  @JoinColumn({ name: 'team_id', foreignKeyConstraintName: 'FK_countdown_templates_team_id' })
  team?: Team;

  @Column({ type: 'varchar', length: 80 })
  name: string;

  @Column({ name: 'event_type', type: 'varchar', length: 16 })
  eventType: EventType;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  description: string | null;

  /** Ordered by offset. */
  @Column({ type: 'jsonb' })
  days: TemplateDay[];

  /** RESTRICT, like a plan version's author (users are deactivated, never deleted). */
  @Index('IDX_countdown_templates_created_by_id')
  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { onDelete: 'RESTRICT', nullable: false })
  @JoinColumn({ name: 'created_by_id', foreignKeyConstraintName: 'FK_countdown_templates_created_by_id' })
  createdBy?: User;
}
