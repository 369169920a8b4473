import type { CheckInQuestion, GuardrailFloors } from '@driftmark/shared';
import { Column, Entity } from 'typeorm';
import { BaseRecord } from './base.entity.js';

/** Team-wide defaults the owner manages; every key optional so old rows stay valid. */
export interface TeamSettings {
  /** Hour (0–23, athlete's time zone) after which a missing weigh-in triggers a reminder. */
  reminderHour?: number;
  /** Condition-photo poses beyond the three relaxed ones (PUT /api/team/poses). */
  poses?: string[];
  /** Guardrail floors for energy and water per sex (PUT /api/team/guardrails); GUARDRAIL_DEFAULTS without. */
  guardrails?: GuardrailFloors;
  /** The questions every weekly check-in asks, in order (PUT /api/team/check-in-questions). */
  checkInQuestions?: CheckInQuestion[];
  /** Acute share of body mass above which a cut plan carries a strong warning, % (PUT /api/team/cut-settings). */
  acuteSharePct?: number;
  /** Demo team only: the instant (ISO 8601) its dates were seeded or last moved for (seed/refresh-demo-dates.ts). */
  demoAnchorAt?: string;
}

@Entity({ name: 'teams' })
export class Team extends BaseRecord {
  @Column({ type: 'varchar', length: 100 })
  name: string;

  @Column({ type: 'jsonb', default: () => "'{}'" })
  settings: TeamSettings;
}
