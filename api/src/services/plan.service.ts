import {
  applyTemplate,
  checkGuardrails,
  countdownMismatch,
  type AthleteProfile,
  moveCountdown,
  unacknowledged,
  validatePlanContent,
  versionInForce,
  type AppliedCountdown,
  type CheckPlanRequest,
  type CountdownPreview,
  type CreatePlanVersionRequest,
  type GuardrailContext,
  type GuardrailFloors,
  type GuardrailWarning,
  type PlanBaseline,
  type PlanCheckResult,
  type PlanContent,
  type PlanVersionView,
  type PlanView,
  type UpdateEventRequest,
  type EVENT_TYPES,
  type applyCountdownRequest,
  type moveCountdownRequest,
} from '@driftmark/shared';
import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { conflict, guardrailsUnacknowledged, notFound, validationFailed } from '../errors.js';
import { shiftDate } from '../lib/dates.js';
import { localDateTime } from '../lib/local-time.js';
import { trendWeightKg } from '../lib/analysis.js';
import type { Actor } from '../policies/actor.js';
import { presentAthleteProfile } from '../presenters/athlete.presenter.js';
import { presentVersion, presentVersionSummary } from '../presenters/plan.presenter.js';
import { AthleteRepository, type AthleteWithPeople } from '../repositories/athlete.repository.js';
import { CountdownTemplateRepository } from '../repositories/countdown-template.repository.js';
import { PlanRepository, type PlanVersionWithAuthor } from '../repositories/plan.repository.js';
import { TeamRepository } from '../repositories/team.repository.js';
import { WeighInRepository } from '../repositories/weigh-in.repository.js';
import { bodyMeasurementViews, latestLeanMass } from './body-composition.service.js';
import { contentWithPlannedFoods } from './meal-plan.service.js';

/** Weigh-ins the baseline trend weight is taken over, in days up to and including today. */
export const TREND_WINDOW_DAYS = 60;

type PlanDeps = { dataSource: DataSource; clock: () => Date };
type ApplyCountdownInput = z.output<typeof applyCountdownRequest>;
type MoveCountdownInput = z.output<typeof moveCountdownRequest>;

/** A countdown request answers with a preview, or with the version it saved. */
export type CountdownResult =
  { kind: 'preview'; preview: CountdownPreview } | { kind: 'saved'; version: PlanVersionView };

/** What every plan computation needs to know about the athlete right now. */
interface Situation {
  today: string;
  baseline: PlanBaseline;
  floors: GuardrailFloors;
}

/**
 * The athlete's figures relative targets resolve against, as of `today`: usual water and energy
 * and sex from the profile, weight = the EWMA trend of the weigh-ins of the last 60 days
 * (Walker, The Hacker's Diet) or, while the athlete has never weighed in, the intake's weight;
 * lean mass = the latest body-composition measurement's (from its day's trend weight).
 */
export async function currentBaseline(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  today: string,
): Promise<PlanBaseline> {
  const from = shiftDate(today, -(TREND_WINDOW_DAYS - 1));
  const weighIns = new WeighInRepository(manager);
  const [weights, measurements] = await Promise.all([
    weighIns.listBetween(athlete.id, from, today),
    bodyMeasurementViews(manager, athlete),
  ]);
  let weightKg = trendWeightKg(weights);
  // The intake's weight stands in only until the first weigh-in ever (not after a long gap).
  const fromIntake =
    weightKg === null && athlete.intakeWeightKg !== null && !(await weighIns.existsFor(athlete.id));
  if (fromIntake) weightKg = athlete.intakeWeightKg;
  const lean = latestLeanMass(measurements, today);
  return {
    usualWaterMl: athlete.usualWaterMl,
    usualEnergyKcal: athlete.usualEnergyKcal,
    weightKg,
    ...(fromIntake ? { weightFromIntake: true } : {}),
    sex: athlete.sex,
    ...(lean ? { leanMassKg: lean.kg, leanMassDate: lean.date } : {}),
  };
}

/**
 * The athlete's profile as the API shows it, with the countdown mismatch worked out from the latest
 * plan version (the one in force from its start on) against the event date, as of the athlete's today.
 */
export async function athleteProfileView(
  manager: EntityManager,
  athlete: AthleteWithPeople,
  now: Date,
): Promise<AthleteProfile> {
  const latest = await new PlanRepository(manager).findLatest(athlete.id);
  const today = localDateTime(now, athlete.user.timeZone).date;
  return presentAthleteProfile(athlete, countdownMismatch(latest?.content ?? null, athlete.eventDate, today));
}

/** Content errors keyed by the request path (`content.dayTypes.0.targets.protein`). */
function contentErrors(content: PlanContent, baseline: PlanBaseline): Record<string, string> {
  return Object.fromEntries(
    Object.entries(validatePlanContent(content, baseline)).map(([path, message]) => [
      `content.${path}`,
      message,
    ]),
  );
}

const pastMessage = (today: string) =>
  `Choose today (${today}) or a later day: past days keep the plan they had`;

/** Refuses with 409 when a current warning is not in `acknowledgedKeys`, naming each one whole. */
function assertAcknowledged(
  warnings: readonly GuardrailWarning[],
  acknowledgedKeys: readonly string[],
): void {
  const missing = unacknowledged(warnings, acknowledgedKeys);
  if (missing.length > 0) throw guardrailsUnacknowledged(missing);
}

export class PlanService {
  constructor(private readonly deps: PlanDeps) {}

  private get manager(): EntityManager {
    return this.deps.dataSource.manager;
  }

  private async situation(athlete: AthleteWithPeople): Promise<Situation> {
    const today = localDateTime(this.deps.clock(), athlete.user.timeZone).date;
    const [baseline, floors] = await Promise.all([
      currentBaseline(this.manager, athlete, today),
      new TeamRepository(this.manager).guardrailFloors(athlete.teamId),
    ]);
    return { today, baseline, floors };
  }

  /** The guardrails' context; a content's countdown names the event it is for. */
  private guardrailContext(
    athlete: AthleteWithPeople,
    s: Situation,
    content: PlanContent | null,
  ): GuardrailContext {
    return {
      baseline: s.baseline,
      floors: s.floors,
      today: s.today,
      eventType: content?.countdown?.eventType ?? athlete.eventType,
      eventDate: content?.countdown?.eventDate ?? athlete.eventDate,
      weighInLimitKg: athlete.weighInLimitKg,
    };
  }

  /** A stored version as the API shows it (with its acknowledgements and what changed). */
  private async view(athleteId: string, version: PlanVersionWithAuthor): Promise<PlanVersionView> {
    const plans = new PlanRepository(this.manager);
    const [previous, acks] = await Promise.all([
      version.number > 1 ? plans.findByNumber(athleteId, version.number - 1) : Promise.resolve(null),
      plans.acknowledgementsByVersion([version.id]),
    ]);
    return presentVersion(version, previous, acks.get(version.id) ?? []);
  }

  /** The history (newest first), the version in force today, the newest one, and the figures now. */
  async getPlan(athlete: AthleteWithPeople): Promise<PlanView> {
    const plans = new PlanRepository(this.manager);
    const [s, versions, counts] = await Promise.all([
      this.situation(athlete),
      plans.listForAthlete(athlete.id),
      plans.acknowledgementCounts(athlete.id),
    ]);
    const byNumber = new Map(versions.map((v) => [v.number, v]));
    const current = versionInForce(versions, s.today);
    const latest = versions.at(-1) ?? null;
    const acks = await plans.acknowledgementsByVersion(
      [current?.id, latest?.id].filter((id): id is string => id !== undefined),
    );
    const full = (v: PlanVersionWithAuthor | null) =>
      v ? presentVersion(v, byNumber.get(v.number - 1) ?? null, acks.get(v.id) ?? []) : null;
    return {
      athleteId: athlete.id,
      today: s.today,
      versions: [...versions]
        .reverse()
        .map((v) => presentVersionSummary(v, byNumber.get(v.number - 1) ?? null, counts.get(v.id) ?? 0)),
      current: full(current),
      latest: full(latest),
      baseline: s.baseline,
      floors: s.floors,
      guardrailContext: this.guardrailContext(athlete, s, latest?.content ?? null),
    };
  }

  async getVersion(athlete: AthleteWithPeople, versionId: string): Promise<PlanVersionView> {
    const version = await new PlanRepository(this.manager).findForAthlete(athlete.id, versionId);
    if (!version) throw notFound();
    return this.view(athlete.id, version);
  }

  /** The refusals and guardrail warnings a draft would meet on save (nothing is stored). */
  async check(athlete: AthleteWithPeople, input: CheckPlanRequest): Promise<PlanCheckResult> {
    const s = await this.situation(athlete);
    const errors = contentErrors(input.content, s.baseline);
    if (input.effectiveFrom !== undefined && input.effectiveFrom < s.today)
      errors.effectiveFrom = pastMessage(s.today);
    return {
      errors,
      warnings: checkGuardrails(input.content, this.guardrailContext(athlete, s, input.content)),
    };
  }

  /**
   * Saves a new version: refused (400) when it starts before the athlete's today or the content
   * breaks a rule, refused (409) while any guardrail warning is unacknowledged; otherwise stored
   * with the baseline snapshot and one acknowledgement per warning, in one transaction.
   */
  async createVersion(
    actor: Actor,
    athlete: AthleteWithPeople,
    input: CreatePlanVersionRequest,
  ): Promise<PlanVersionView> {
    const s = await this.situation(athlete);
    const errors = contentErrors(input.content, s.baseline);
    if (input.effectiveFrom < s.today) errors.effectiveFrom = pastMessage(s.today);
    if (Object.keys(errors).length > 0) throw validationFailed(errors);
    const content = await contentWithPlannedFoods(this.manager, athlete.teamId, input.content);
    const warnings = checkGuardrails(content, this.guardrailContext(athlete, s, content));
    assertAcknowledged(warnings, input.acknowledgedKeys);
    return this.save(actor, athlete, s, {
      effectiveFrom: input.effectiveFrom,
      reason: input.reason,
      content,
      warnings,
    });
  }

  /**
   * Stores a version (and its acknowledgements). With `event`, the athlete's event date moves with
   * it in the same transaction: a countdown and the event it counts back from never part.
   */
  private async save(
    actor: Actor,
    athlete: AthleteWithPeople,
    s: Situation,
    v: {
      effectiveFrom: string;
      reason: string;
      content: PlanContent;
      warnings: readonly GuardrailWarning[];
      event?: { date: string; type: (typeof EVENT_TYPES)[number] };
    },
  ): Promise<PlanVersionView> {
    const saved = await this.deps.dataSource.transaction(async (manager) => {
      const version = await new PlanRepository(manager).insertVersion({
        athleteId: athlete.id,
        effectiveFrom: v.effectiveFrom,
        reason: v.reason,
        content: v.content,
        baseline: s.baseline,
        createdById: actor.userId,
        acknowledgements: v.warnings,
      });
      if (v.event && v.event.date !== athlete.eventDate) {
        // An athlete without an event gets the countdown's kind of event with its date.
        const typeless = athlete.eventType === null || athlete.eventType === 'none';
        await new AthleteRepository(manager).update(athlete.id, {
          eventDate: v.event.date,
          ...(typeless ? { eventType: v.event.type } : {}),
        });
      }
      return version;
    });
    const version = await new PlanRepository(this.manager).findForAthlete(athlete.id, saved.id);
    if (!version) throw notFound();
    return this.view(athlete.id, version);
  }

  /**
   * Applies a team template for `eventDate`: the version in force on the first countdown day (or
   * a starter) with its earlier countdown days replaced by the template's, dated from the event;
   * days already past are listed but not added. `preview` only computes.
   */
  async applyCountdown(
    actor: Actor,
    athlete: AthleteWithPeople,
    input: ApplyCountdownInput,
  ): Promise<CountdownResult> {
    const template = await new CountdownTemplateRepository(this.manager).findInTeam(
      input.templateId,
      athlete.teamId,
    );
    if (!template) throw validationFailed({ templateId: "Choose a template from your team's library" });
    const offsets = template.days.map((d) => d.offset);
    const s = await this.situation(athlete);
    if (shiftDate(input.eventDate, Math.max(...offsets)) < s.today)
      throw validationFailed({ eventDate: 'Every day of this countdown would be in the past' });
    const firstDate = shiftDate(input.eventDate, Math.min(...offsets));
    const effectiveFrom = firstDate > s.today ? firstDate : s.today;
    const versions = await new PlanRepository(this.manager).listForAthlete(athlete.id);
    const applied = applyTemplate({
      base: versionInForce(versions, effectiveFrom)?.content ?? null,
      template: { id: template.id, name: template.name, days: template.days },
      eventDate: input.eventDate,
      eventType: template.eventType,
      today: s.today,
      baseline: s.baseline,
    });
    return this.finishCountdown(
      actor,
      athlete,
      s,
      applied,
      input,
      `Countdown "${template.name}" for ${input.eventDate}`,
    );
  }

  /** Moves the latest version's countdown to a new event date (409 when it has none). */
  async moveCountdown(
    actor: Actor,
    athlete: AthleteWithPeople,
    input: MoveCountdownInput,
  ): Promise<CountdownResult> {
    const latest = await new PlanRepository(this.manager).findLatest(athlete.id);
    const countdown = latest?.content.countdown;
    if (!latest || !countdown) throw conflict('The latest plan version has no countdown to move.');
    const s = await this.situation(athlete);
    const offsets = latest.content.dates.flatMap((d) =>
      d.countdownOffset === null ? [] : [d.countdownOffset],
    );
    if (offsets.length > 0 && shiftDate(input.eventDate, Math.max(...offsets)) < s.today)
      throw validationFailed({ eventDate: 'Every day of this countdown would be in the past' });
    const earlier = (await new PlanRepository(this.manager).listForAthlete(athlete.id))
      .filter((v) => v.id !== latest.id)
      .sort((a, b) => b.number - a.number)
      .map((v) => v.content);
    const applied = moveCountdown({
      content: latest.content,
      eventDate: input.eventDate,
      today: s.today,
      baseline: s.baseline,
      earlier,
    });
    return this.finishCountdown(
      actor,
      athlete,
      s,
      applied,
      input,
      `Countdown "${countdown.templateName}" moved to ${input.eventDate}`,
    );
  }

  private async finishCountdown(
    actor: Actor,
    athlete: AthleteWithPeople,
    s: Situation,
    applied: AppliedCountdown,
    input: { eventDate: string; preview: boolean; reason?: string | undefined; acknowledgedKeys: string[] },
    defaultReason: string,
  ): Promise<CountdownResult> {
    const errors = contentErrors(applied.content, s.baseline);
    if (Object.keys(errors).length > 0) {
      const first = Object.values(errors)[0];
      throw validationFailed(errors, `This countdown cannot be applied to this athlete: ${first}`);
    }
    const warnings = checkGuardrails(applied.content, this.guardrailContext(athlete, s, applied.content));
    if (input.preview) {
      return {
        kind: 'preview',
        preview: {
          eventDate: input.eventDate,
          effectiveFrom: applied.effectiveFrom,
          days: applied.days,
          baseline: s.baseline,
          warnings,
          content: applied.content,
        },
      };
    }
    assertAcknowledged(warnings, input.acknowledgedKeys);
    const countdown = applied.content.countdown;
    const version = await this.save(actor, athlete, s, {
      effectiveFrom: applied.effectiveFrom,
      reason: input.reason ?? defaultReason,
      content: applied.content,
      warnings,
      ...(countdown ? { event: { date: countdown.eventDate, type: countdown.eventType } } : {}),
    });
    return { kind: 'saved', version };
  }

  /**
   * Changes the athlete's event date (and time and name when given). The countdown stays where it
   * is: while it aims at another day, the profile's `countdownMismatch` says so until the coach
   * moves it (`moveCountdown`, which moves the event date with it).
   */
  async updateEvent(athlete: AthleteWithPeople, input: UpdateEventRequest) {
    const athletes = new AthleteRepository(this.manager);
    await athletes.update(athlete.id, {
      eventDate: input.eventDate,
      ...(input.eventTime !== undefined ? { eventTime: input.eventTime } : {}),
      ...(input.eventName !== undefined ? { eventName: input.eventName || null } : {}),
    });
    const updated = await athletes.findWithPeople(athlete.id);
    if (!updated) throw notFound();
    return { athlete: await athleteProfileView(this.manager, updated, this.deps.clock()) };
  }
}
