import { createBodyMeasurementRequest } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { emptyMeasurementForm, toMeasurementRequest } from './measurement-form';

describe('toMeasurementRequest', () => {
  it('sends the typed skinfolds (decimal comma read by the shared rule) and leaves blanks out', () => {
    const v = emptyMeasurementForm('2026-12-01', 168);
    v.skinfoldsMm.triceps = '18,5';
    v.skinfoldsMm.suprailiac = '16';
    v.skinfoldsMm.thigh = ' 26 ';
    v.measuredBy = 'Coach';
    const { request } = toMeasurementRequest(v);
    expect(request).toEqual({
      date: '2026-12-01',
      method: 'skinfold_3',
      densityEquation: 'siri',
      measuredBy: 'Coach',
      skinfoldsMm: { triceps: 18.5, suprailiac: 16, thigh: 26 },
    });
    expect(createBodyMeasurementRequest.safeParse(request).success).toBe(true);
  });

  it('sends only circumferences for that method; text that is not a number is refused by the schema', () => {
    const v = { ...emptyMeasurementForm('2026-12-01', 168), method: 'circumference' as const };
    v.neckCm = '33';
    v.waistCm = '7o';
    v.measuredBy = 'self';
    const { request } = toMeasurementRequest(v);
    expect(request).not.toHaveProperty('skinfoldsMm');
    expect(request.heightCm).toBe(168);
    const parsed = createBodyMeasurementRequest.safeParse(request);
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['waistCm', 'Waist must be a number'],
    ]);
  });
});
