import { FLAG_KINDS, SAFETY_FLAG_KINDS, type FlagKind } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { hasSafetyFlag, isSafetyFlag } from './athlete-figures.service.js';

describe('the one rule for "has a safety flag"', () => {
  it('names the brief’s safety flags: a ≥ 2 % drop (ACSM 2007), a rate far beyond guidance (Garthe 2011), a symptom', () => {
    // PRODUCT.md, Safety: "flags, and e-mails the coach at once: a day-over-day weight drop of 2 % of
    // body mass or more, a weekly rate far beyond guidance, and any symptom report".
    expect([...SAFETY_FLAG_KINDS].sort()).toEqual(['acute_drop', 'rate_far_beyond', 'symptom']);
    const table: Record<FlagKind, boolean> = {
      acute_drop: true,
      rate_far_beyond: true,
      symptom: true,
      // A rate just beyond 1 %/week is drift (Helms 2014); missed weigh-ins are a missed check-in.
      rate_beyond: false,
      missed_weigh_ins: false,
    };
    for (const kind of FLAG_KINDS) expect(isSafetyFlag(kind), kind).toBe(table[kind]);
  });

  it('holds for an active athlete with a safety flag or a flag row, never for one who is not active', () => {
    const active = { status: 'active' } as const;
    expect(hasSafetyFlag({ athlete: active, flags: [{ kind: 'missed_weigh_ins' }], flagRows: [] })).toBe(
      false,
    );
    expect(hasSafetyFlag({ athlete: active, flags: [{ kind: 'rate_beyond' }], flagRows: [] })).toBe(false);
    expect(hasSafetyFlag({ athlete: active, flags: [{ kind: 'acute_drop' }], flagRows: [] })).toBe(true);
    expect(hasSafetyFlag({ athlete: active, flags: [], flagRows: [{ kind: 'symptom' }] })).toBe(true);
    for (const status of ['intake_pending', 'ended'] as const) {
      expect(hasSafetyFlag({ athlete: { status }, flags: [{ kind: 'acute_drop' }], flagRows: [] })).toBe(
        false,
      );
    }
  });
});
