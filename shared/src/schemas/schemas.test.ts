import { describe, expect, it } from 'vitest';
import { intakeRequestOn, ageOn } from './athletes.js';
import { LIMITS } from '../limits.js';
import { signInRequest, changePasswordRequest, resetPasswordRequest } from './auth.js';
import { acceptInvitationRequest, createInvitationRequest } from './invitations.js';
import { datesWithin, dateWindow, dateWindowProblem, isoDate, text } from './common.js';
import { addYears } from '../calendar.js';
import { z } from 'zod';

/** The pinned day the intakes below are checked on. */
const TODAY = '2026-06-01';
const intakeRequest = intakeRequestOn(TODAY);

const validIntake = {
  sex: 'female',
  birthDate: '1996-04-12',
  heightCm: 165,
  currentWeightKg: 62,
  usualWaterMl: 3000,
  usualEnergyKcal: 2100,
  goal: 'lose',
  eventType: 'show',
  eventName: 'Coastal Open',
  eventDate: '2027-03-14',
  eventTime: '09:30',
  eventTimeZone: 'Europe/Lisbon',
  division: 'Figure',
  timeZone: 'Europe/Lisbon',
  weightUnit: 'kg',
  volumeUnit: 'ml',
  photoConsent: true,
  safetyAcknowledged: true,
} as const;

function fieldsOf(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }): string[] {
  return result.error ? result.error.issues.map((i) => i.path.join('.')) : [];
}

describe('intakeRequest', () => {
  it('accepts a complete intake', () => {
    expect(intakeRequest.safeParse(validIntake).success).toBe(true);
  });

  it('names the field for implausible values', () => {
    const r = intakeRequest.safeParse({
      ...validIntake,
      heightCm: 20,
      usualWaterMl: -5,
      currentWeightKg: 400,
    });
    expect(fieldsOf(r)).toEqual(expect.arrayContaining(['heightCm', 'usualWaterMl', 'currentWeightKg']));
  });

  it('requires the acknowledgement to be ticked', () => {
    const r = intakeRequest.safeParse({ ...validIntake, safetyAcknowledged: false });
    expect(fieldsOf(r)).toContain('safetyAcknowledged');
  });

  it('requires an event date and time zone unless there is no event', () => {
    const r = intakeRequest.safeParse({ ...validIntake, eventDate: undefined, eventTimeZone: undefined });
    expect(fieldsOf(r)).toEqual(expect.arrayContaining(['eventDate', 'eventTimeZone']));
    const none = intakeRequest.safeParse({
      ...validIntake,
      eventType: 'none',
      eventDate: undefined,
      eventTimeZone: undefined,
    });
    expect(none.success).toBe(true);
  });

  it('requires a weigh-in limit for a weigh-in', () => {
    const r = intakeRequest.safeParse({ ...validIntake, eventType: 'weigh_in' });
    expect(fieldsOf(r)).toContain('weighInLimitKg');
  });

  it('refuses an unknown time zone', () => {
    const r = intakeRequest.safeParse({ ...validIntake, timeZone: 'Mars/Olympus' });
    expect(fieldsOf(r)).toContain('timeZone');
  });
});

describe('ageOn', () => {
  it('counts whole years, turning over on the birthday', () => {
    expect(ageOn('2000-06-15', '2026-06-14')).toBe(25);
    expect(ageOn('2000-06-15', '2026-06-15')).toBe(26);
  });
});

describe('isoDate', () => {
  it('refuses impossible dates', () => {
    expect(isoDate.safeParse('2026-02-30').success).toBe(false);
    expect(isoDate.safeParse('2024-02-29').success).toBe(true);
  });
});

describe('auth schemas', () => {
  it('normalises the e-mail', () => {
    expect(signInRequest.parse({ email: '  Coach@Driftmark.TEST ', password: 'x' }).email).toBe(
      'coach@driftmark.test',
    );
  });

  it('refuses a new password equal to the current one, on the new field', () => {
    const r = changePasswordRequest.safeParse({
      currentPassword: 'same-password-1',
      newPassword: 'same-password-1',
    });
    expect(fieldsOf(r)).toEqual(['newPassword']);
  });

  it('refuses an owner invitation role', () => {
    const r = createInvitationRequest.safeParse({ email: 'a@b.test', name: 'A', role: 'owner' });
    expect(fieldsOf(r)).toEqual(['role']);
  });
});

describe('intakeRequest cross-field rules', () => {
  it('counts the age limits to the day it is given, not to the machine’s clock', () => {
    const youngest = `${2026 - LIMITS.ageYears.min}-06-01`;
    const dayAfter = `${2026 - LIMITS.ageYears.min}-06-02`;
    expect(intakeRequestOn(TODAY).safeParse({ ...validIntake, birthDate: youngest }).success).toBe(true);
    expect(fieldsOf(intakeRequestOn(TODAY).safeParse({ ...validIntake, birthDate: dayAfter }))).toEqual([
      'birthDate',
    ]);
    expect(intakeRequestOn('2026-06-02').safeParse({ ...validIntake, birthDate: dayAfter }).success).toBe(
      true,
    );
  });

  it('reports a missing event date together with other field errors in one round', () => {
    const r = intakeRequest.safeParse({ ...validIntake, heightCm: 5, eventDate: undefined });
    expect(fieldsOf(r)).toEqual(expect.arrayContaining(['heightCm', 'eventDate']));
  });
});

describe('weighInRequest', () => {
  it('reports an implausible weight together with a missing protocol tick', async () => {
    const { weighInRequest } = await import('./check-ins.js');
    const r = weighInRequest.safeParse({ weight: 900, unit: 'kg', time: '07:10' });
    expect(fieldsOf(r)).toEqual(expect.arrayContaining(['weight', 'protocolConfirmed']));
  });

  it('accepts 176.4 lb (80.0 kg) and refuses 0 kg', async () => {
    const { weighInRequest } = await import('./check-ins.js');
    const ok = { weight: 176.4, unit: 'lb', time: '07:10', protocolConfirmed: true };
    expect(weighInRequest.safeParse(ok).success).toBe(true);
    expect(fieldsOf(weighInRequest.safeParse({ ...ok, weight: 0, unit: 'kg' }))).toEqual(['weight']);
  });
});

describe('passwords over 72 bytes', () => {
  // 'ü' is 2 bytes in UTF-8 (RFC 3629, table in §3): 40 of them are 40 characters and 80 bytes.
  const long = 'ü'.repeat(40);
  const token = 't'.repeat(43);

  it('are refused on the field that carries them, in every form that sets a password', () => {
    expect(fieldsOf(resetPasswordRequest.safeParse({ token, password: long }))).toEqual(['password']);
    expect(
      fieldsOf(acceptInvitationRequest.safeParse({ token, name: 'Ana Ruiz', password: long })),
    ).toContain('password');
    expect(
      fieldsOf(changePasswordRequest.safeParse({ currentPassword: 'old-password-1', newPassword: long })),
    ).toEqual(['newPassword']);
  });

  it('still reach sign-in, where they simply do not match', () => {
    expect(signInRequest.safeParse({ email: 'a@example.test', password: long }).success).toBe(true);
  });
});

describe('text (the one input policy for free text)', () => {
  const note = text('Note', { max: 10 });
  const required = text('Name', { min: 1, max: 10 });

  it('refuses NUL and the other control characters, naming the field', () => {
    for (const c of ['\u0000', '\u0007', '\u000b', '\u001b', '\u007f', '\u0085']) {
      const r = note.safeParse(`a${c}b`);
      expect(r.success, JSON.stringify(c)).toBe(false);
      expect(r.error?.issues[0]?.message).toBe('Note contains a control character; remove it');
    }
  });

  it('keeps tab and newline, and turns CR LF and CR into a newline', () => {
    expect(note.parse('a\tb\nc')).toBe('a\tb\nc');
    expect(note.parse('a\r\nb\rc')).toBe('a\nb\nc');
  });

  it('refuses half of a surrogate pair but keeps a whole one', () => {
    expect(note.safeParse('a\ud800b').success).toBe(false);
    expect(note.parse('🙂')).toBe('🙂');
  });

  it('trims and NFC-normalises before counting', () => {
    // "é" as e + U+0301 COMBINING ACUTE ACCENT is one character once composed (Unicode UAX #15).
    expect(note.parse('  e\u0301  ')).toBe('\u00e9');
    expect(note.parse('e\u0301'.repeat(10))).toBe('\u00e9'.repeat(10));
    expect(note.safeParse('x'.repeat(11)).error?.issues[0]?.message).toBe('At most 10 characters');
  });

  it('a required field says so when blank or missing', () => {
    expect(required.safeParse('   ').error?.issues[0]?.message).toBe('Name is required');
    expect(required.safeParse(undefined).error?.issues[0]?.message).toBe('Name is required');
  });
});

describe('date windows', () => {
  it('moves by whole years, 29 February to 28 February in a common year', () => {
    // Calendar arithmetic checked by hand against the Gregorian calendar (2024 leap, 2019 and 2027 not).
    expect(addYears('2024-02-29', -5)).toBe('2019-02-28');
    expect(addYears('2024-02-29', 4)).toBe('2028-02-29');
    expect(addYears('2026-12-01', 3)).toBe('2029-12-01');
  });

  it('past: back LIMITS.dateWindow.historyYears and not after today; any: up to aheadYears ahead', () => {
    expect(dateWindow(TODAY, 'past')).toEqual({ earliest: '2021-06-01', latest: TODAY });
    expect(dateWindow(TODAY, 'any')).toEqual({ earliest: '2021-06-01', latest: '2029-06-01' });
    expect(dateWindowProblem('2021-06-01', TODAY, 'past')).toBeNull();
    expect(dateWindowProblem('2021-05-31', TODAY, 'past')).toMatch(/No earlier than 2021-06-01/);
    expect(dateWindowProblem('2026-06-02', TODAY, 'past')).toMatch(/future/);
    expect(dateWindowProblem('2029-06-01', TODAY, 'any')).toBeNull();
    expect(dateWindowProblem('2029-06-02', TODAY, 'any')).toMatch(/No later than 2029-06-01/);
  });

  it('datesWithin names the field it refuses', () => {
    const schema = datesWithin(z.object({ eventDate: isoDate }), TODAY, { eventDate: 'any' });
    const r = schema.safeParse({ eventDate: '9999-12-31' });
    expect(fieldsOf(r)).toEqual(['eventDate']);
  });
});
