import { circumferenceFatPercent, createBodyMeasurementRequest } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import { emptyMeasurementForm, measurementMessage, toMeasurementRequest } from './measurement-form';

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

describe('lengths typed in inches (viewers who weigh in pounds)', () => {
  it('sends cm through the shared conversion: the woman of the Navy worked case reads 28.5563 % fat', () => {
    // REFERENCES.md §3 "Navy", woman: waist 30, hip 38, neck 13, height 65 in → inch form 28.5563 %
    // (Hodgdon & Friedl 1999, NHRC TD 99-2B); 1 in = 2.54 cm exactly (NIST SP 811 App. B).
    const v = { ...emptyMeasurementForm('2026-12-01', null, 'in'), method: 'circumference' as const };
    Object.assign(v, { waistCm: '30', hipCm: '38', neckCm: '13', heightCm: '65', measuredBy: 'self' });
    const { request } = toMeasurementRequest(v, 'in');
    expect(request).toMatchObject({ waistCm: 76.2, hipCm: 96.52, neckCm: 33.02, heightCm: 165.1 });
    const parsed = createBodyMeasurementRequest.parse(request);
    const pct = circumferenceFatPercent('female', {
      waistCm: parsed.waistCm!,
      hipCm: parsed.hipCm!,
      neckCm: parsed.neckCm!,
      heightCm: parsed.heightCm!,
    });
    expect(pct).toBeCloseTo(28.5563, 4);
  });

  it('shows the profile height in inches and sends it back exactly while the box is unchanged', () => {
    // 168 cm / 2.54 = 66.14 in → "66.1".
    const v = { ...emptyMeasurementForm('2026-12-01', 168, 'in'), method: 'circumference' as const };
    expect(v.heightCm).toBe('66.1');
    expect(toMeasurementRequest(v, 'in', 168).request.heightCm).toBe(168);
    v.heightCm = '66';
    expect(toMeasurementRequest(v, 'in', 168).request.heightCm).toBeCloseTo(167.64, 10);
  });

  it('leaves skinfolds in mm', () => {
    const v = emptyMeasurementForm('2026-12-01', 168, 'in');
    v.skinfoldsMm.triceps = '18';
    expect(toMeasurementRequest(v, 'in').request.skinfoldsMm).toEqual({ triceps: 18 });
  });

  it('says the schema’s cm range in inches, rounded inward', () => {
    const v = { ...emptyMeasurementForm('2026-12-01', null, 'in'), method: 'circumference' as const };
    Object.assign(v, { waistCm: '14', neckCm: '30', heightCm: '65', measuredBy: 'self' });
    const parsed = createBodyMeasurementRequest.safeParse(toMeasurementRequest(v, 'in').request);
    const issues = Object.fromEntries(
      (parsed.error?.issues ?? []).map((i) => [i.path.join('.'), { type: i.code, message: i.message }]),
    );
    // Waist 40–200 cm = 15.748–78.740 in → "at least 15.8 in"; neck 20–70 cm = 7.874–27.559 in → "at most 27.5 in".
    expect(measurementMessage('waistCm', issues.waistCm!, 'in')).toBe('Waist must be at least 15.8 in');
    expect(measurementMessage('neckCm', issues.neckCm!, 'in')).toBe('Neck must be at most 27.5 in');
    expect(measurementMessage('waistCm', issues.waistCm!, 'cm')).toBe('Waist must be at least 40 cm');
    expect(measurementMessage('date', { type: 'custom', message: 'Not after today' }, 'in')).toBe(
      'Not after today',
    );
  });
});
