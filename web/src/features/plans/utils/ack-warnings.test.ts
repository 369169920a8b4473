import { CUT_SOURCES, type CutWarningView, type GuardrailWarning } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { ApiError, parseErrorBody } from '../../../lib/api-client';
import { judgedWarnings } from '../../../lib/judged-warnings';
import { unacknowledgedFromError, type AckWarning } from './ack-warnings';

// Warnings shaped as the server sends them (messages and sources shortened fixture text).
const sodium: GuardrailWarning = {
  key: 'sodium_low:type:rest',
  code: 'sodium_low',
  severity: 'warning',
  scope: { kind: 'day_type', key: 'rest' },
  message: 'Rest day: sodium 1,200 mg is below 1,500 mg.',
  source: 'NASEM 2019, doi:10.17226/25353',
  field: 'dayTypes.1.targets.sodiumMg',
};
const lossRate: GuardrailWarning = {
  key: 'loss_rate:plan',
  code: 'loss_rate',
  severity: 'warning',
  scope: { kind: 'plan' },
  message: 'The planned loss is faster than 1 % of body weight a week.',
  source: 'Helms, Aragon & Fitschen 2014, JISSN 11:20',
  field: null,
};
// A key the old prefix guess would have called a plain warning, judged strong by the server.
const fluid: GuardrailWarning = {
  key: 'fluid_restriction:date:2026-12-05',
  code: 'fluid_restriction',
  severity: 'strong',
  scope: { kind: 'date', date: '2026-12-05' },
  message: 'Sat 5 Dec 2026: fluid below 1 L.',
  source: 'Case reports of fluid restriction before weigh-ins',
  field: 'dates.0.targets.waterMl',
};
const acuteShare: CutWarningView = {
  key: 'acute_share',
  severity: 'strong',
  message: 'The last days must take off 3.5 kg, 5.3 % of body mass.',
  source: CUT_SOURCES.acuteShare,
  stopSigns: null,
  needsAcknowledgement: true,
};

/** A 409 body as api/src/errors.ts `guardrailsUnacknowledged` sends it. */
function refusal(warnings: readonly (GuardrailWarning | CutWarningView)[], withWarnings = true): ApiError {
  return parseErrorBody(409, {
    error: {
      code: 'guardrails_unacknowledged',
      message: `${warnings.length} guardrail warnings need your acknowledgement before this can be saved.`,
      fields: Object.fromEntries(warnings.map((w) => [w.key, w.message])),
      ...(withWarnings ? { warnings } : {}),
      requestId: 'req-1',
    },
  });
}

describe('unacknowledgedFromError', () => {
  it('lists the server’s warnings with the server’s severity, source and place', () => {
    const list = unacknowledgedFromError(refusal([sodium, fluid, lossRate]), [], (w) =>
      w.scope.kind === 'plan' ? 'Whole plan' : null,
    );
    expect(list).toEqual([
      { key: sodium.key, message: sodium.message, source: sodium.source, severity: 'warning', where: null },
      { key: fluid.key, message: fluid.message, source: fluid.source, severity: 'strong', where: null },
      {
        key: lossRate.key,
        message: lossRate.message,
        source: lossRate.source,
        severity: 'warning',
        where: 'Whole plan',
      },
    ]);
  });

  it('takes a cut-plan warning as the server sent it', () => {
    expect(unacknowledgedFromError(refusal([acuteShare]), [])).toEqual([
      {
        key: 'acute_share',
        message: acuteShare.message,
        source: acuteShare.source,
        severity: 'strong',
        where: null,
      },
    ]);
  });

  it('keeps the warnings already listed, and the server’s verdict wins for one it names again', () => {
    const known: AckWarning[] = [
      { key: sodium.key, message: sodium.message, source: sodium.source, severity: 'warning', where: null },
      { key: fluid.key, message: 'stale wording', source: '', severity: 'warning', where: null },
    ];
    const list = unacknowledgedFromError(refusal([fluid]), known);
    expect(list?.map((w) => [w.key, w.severity, w.message, w.source])).toEqual([
      [sodium.key, 'warning', sodium.message, sodium.source],
      [fluid.key, 'strong', fluid.message, fluid.source],
    ]);
  });

  it('without `warnings` in the body: the known warning if listed, else the key and message at the higher severity, no source', () => {
    const known: AckWarning[] = [
      { key: sodium.key, message: sodium.message, source: sodium.source, severity: 'warning', where: null },
    ];
    expect(unacknowledgedFromError(refusal([sodium, lossRate], false), known)).toEqual([
      known[0],
      { key: lossRate.key, message: lossRate.message, source: '', severity: 'strong', where: null },
    ]);
  });

  it('leaves out an item of `warnings` the shared schema does not accept', () => {
    const error = parseErrorBody(409, {
      error: {
        code: 'guardrails_unacknowledged',
        message: 'x',
        fields: { [sodium.key]: sodium.message, [fluid.key]: fluid.message },
        warnings: [sodium, { key: fluid.key, severity: 'severe' }, 'not a warning'],
      },
    });
    expect(judgedWarnings(error)).toEqual([sodium]);
    // The one the server did not send whole: shown from `fields` at the higher severity.
    expect(unacknowledgedFromError(error, [])?.map((w) => [w.key, w.severity, w.source])).toEqual([
      [sodium.key, 'warning', sodium.source],
      [fluid.key, 'strong', ''],
    ]);
  });

  it('is null for any other error', () => {
    expect(
      unacknowledgedFromError(new ApiError({ status: 409, code: 'conflict', message: 'x' }), []),
    ).toBeNull();
    expect(unacknowledgedFromError(new Error('boom'), [])).toBeNull();
  });
});
