import type { DaySummary } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { symptomMarker, withGaps } from './history';
import { hasUrgentSymptom } from './symptoms';

function day(date: string, extra: Partial<DaySummary> = {}): DaySummary {
  return {
    date,
    weightKg: 70,
    fluidTotalMl: 2000,
    energyKcal: 2000,
    proteinG: 150,
    mealCount: 3,
    hasEvening: true,
    symptomCount: 0,
    urgent: false,
    photoCount: 0,
    ...extra,
  };
}

describe('withGaps', () => {
  it('shows the stretches nothing was logged between logged days, newest first', () => {
    const items = withGaps([day('2026-11-25'), day('2026-12-01'), day('2026-11-30')], '2026-12-01');
    expect(items).toEqual([
      { kind: 'day', day: day('2026-12-01') },
      { kind: 'day', day: day('2026-11-30') },
      { kind: 'gap', from: '2026-11-26', to: '2026-11-29', days: 4 },
      { kind: 'day', day: day('2026-11-25') },
    ]);
  });

  it('does not count today as missed while it is under way', () => {
    expect(withGaps([day('2026-11-30')], '2026-12-01')).toEqual([{ kind: 'day', day: day('2026-11-30') }]);
    expect(withGaps([day('2026-11-28')], '2026-12-01')[0]).toEqual({
      kind: 'gap',
      from: '2026-11-29',
      to: '2026-11-30',
      days: 2,
    });
  });
});

describe('symptom markers', () => {
  it('puts urgent symptoms first', () => {
    expect(symptomMarker({ urgent: true, symptomCount: 1 })).toBe('urgent');
    expect(symptomMarker({ urgent: false, symptomCount: 2 })).toBe('symptom');
    expect(symptomMarker({ urgent: false, symptomCount: 0 })).toBeNull();
  });

  it('knows which symptoms stop the plan', () => {
    expect(hasUrgentSymptom(['headache', 'muscle_cramps'])).toBe(false);
    expect(hasUrgentSymptom(['headache', 'palpitations'])).toBe(true);
  });
});
