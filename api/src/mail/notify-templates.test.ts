import { describe, expect, it } from 'vitest';
import {
  renderMarkCreatedMail,
  renderMorningReminderMail,
  renderSafetyFlagMail,
  renderWeeklySummaryMail,
} from './notify-templates.js';

const base = {
  name: 'Tess <b>Okoro</b>',
  link: 'http://127.0.0.1:3000/coach/athletes/abc?date=2026-12-01',
  settingsLink: 'http://127.0.0.1:3000/settings',
  unsubscribeLink: 'http://127.0.0.1:3000/unsubscribe?token=a.b.c',
};

describe('notification templates', () => {
  it('escapes values in the HTML part and keeps the text part readable', () => {
    const mail = renderSafetyFlagMail({
      ...base,
      athleteName: 'Ana "<script>"',
      date: '2026-12-01',
      message: 'Urgent symptoms reported at 10:00: Fainting',
    });
    expect(mail.subject).toBe('Safety flag: Ana "<script>"');
    expect(mail.html).not.toContain('<script>');
    expect(mail.html).toContain('Ana &quot;&lt;script&gt;&quot;');
    expect(mail.text).toContain('Hello Tess <b>Okoro</b>,');
    expect(mail.text).toContain('Urgent symptoms reported at 10:00: Fainting');
  });

  it('links the screen, the settings and the unsubscribe page in both parts', () => {
    const mail = renderMorningReminderMail({
      ...base,
      link: 'http://127.0.0.1:3000/athlete',
      date: '2026-12-01',
    });
    for (const url of ['http://127.0.0.1:3000/athlete', base.settingsLink, base.unsubscribeLink]) {
      expect(mail.text).toContain(url);
      expect(mail.html).toContain(`href="${url}"`);
    }
    expect(mail.text).toContain('"Morning reminder when no weigh-in is logged" is on');
  });

  it('names a one-day mark span once and a range with both ends', () => {
    const one = renderMarkCreatedMail({
      ...base,
      authorName: 'Mara',
      fromDate: '2026-12-01',
      toDate: '2026-12-01',
      note: 'x',
    });
    const range = renderMarkCreatedMail({
      ...base,
      authorName: 'Mara',
      fromDate: '2026-12-01',
      toDate: '2026-12-03',
      note: 'x',
    });
    expect(one.text).toContain('for 2026-12-01:');
    expect(range.text).toContain('for 2026-12-01 to 2026-12-03:');
  });

  it('lists every athlete in the weekly summary', () => {
    const mail = renderWeeklySummaryMail({
      ...base,
      week: '2026-W50',
      lines: [
        { athleteName: 'A', weighIns: 7, flags: 1, checkIn: 'submitted' },
        { athleteName: 'B', weighIns: 3, flags: 0, checkIn: 'missing' },
      ],
    });
    expect(mail.text).toContain('A: 7/7 weigh-ins, 1 safety flag, weekly check-in submitted');
    expect(mail.text).toContain('B: 3/7 weigh-ins, 0 safety flags, weekly check-in missing');
    expect(mail.subject).toBe('Your roster, week 2026-W50');
  });

  it('refuses a link that is not http(s)', () => {
    expect(() =>
      renderMorningReminderMail({ ...base, link: 'javascript:alert(1)', date: '2026-12-01' }),
    ).toThrow(/http/);
  });
});
