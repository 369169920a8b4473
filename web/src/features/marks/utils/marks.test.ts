import type { MarkReplyView, MarkView } from '@driftmark/shared';
import { describe, expect, it } from 'vitest';
import {
  countUnread,
  describeMark,
  formatMarkDay,
  formatMarkRange,
  formatMarkTime,
  isEdited,
  markRangeDays,
  readReceipt,
  sortNewestFirst,
  visibleReplies,
} from './marks';

const COACH = { id: '00000000-0000-4000-8000-000000000001', name: 'Ines Coach', role: 'coach' as const };
const ATHLETE = { id: '00000000-0000-4000-8000-000000000002', name: 'Maya Reyes', role: 'athlete' as const };

function reply(author: MarkReplyView['author'], createdAt: string): MarkReplyView {
  return { id: `r-${createdAt}`, author, body: 'ok', createdAt };
}

function mark(overrides: Partial<MarkView> = {}): MarkView {
  return {
    id: '00000000-0000-4000-8000-0000000000aa',
    athleteId: '00000000-0000-4000-8000-0000000000bb',
    author: COACH,
    metric: 'weight',
    fromDate: '2026-11-24',
    toDate: '2026-11-29',
    note: 'Water cut starts here',
    createdAt: '2026-11-30T08:00:00.000Z',
    updatedAt: '2026-11-30T08:00:00.000Z',
    replies: [],
    unread: false,
    readByOtherAt: null,
    ...overrides,
  };
}

describe('formatMarkRange', () => {
  it('writes one day with its weekday', () => {
    expect(formatMarkDay('2026-11-24')).toBe('Tue 24 Nov');
    expect(formatMarkRange('2026-11-24', '2026-11-24')).toBe('Tue 24 Nov');
  });

  it('writes a range with an en dash', () => {
    expect(formatMarkRange('2026-11-24', '2026-11-29')).toBe('Tue 24 Nov – Sun 29 Nov');
  });

  it('adds the year when a range crosses the new year', () => {
    expect(formatMarkRange('2026-12-28', '2027-01-03')).toBe('Mon 28 Dec 2026 – Sun 3 Jan 2027');
  });

  it('adds the year when the mark is not from the reference year', () => {
    expect(formatMarkRange('2025-11-24', '2025-11-29', 2026)).toBe('Mon 24 Nov 2025 – Sat 29 Nov 2025');
    expect(formatMarkRange('2026-11-24', '2026-11-29', 2026)).toBe('Tue 24 Nov – Sun 29 Nov');
  });

  it('counts both ends of the range', () => {
    expect(markRangeDays('2026-11-24', '2026-11-24')).toBe(1);
    expect(markRangeDays('2026-11-24', '2026-11-29')).toBe(6);
    expect(markRangeDays('2026-02-27', '2026-03-01')).toBe(3);
  });

  it('names the mark with its chart and dates', () => {
    expect(describeMark(mark())).toBe('Weight mark, Tue 24 Nov – Sun 29 Nov');
  });
});

describe('formatMarkTime', () => {
  const now = new Date('2026-12-02T10:00:00Z');

  it('says today and yesterday on the viewer’s clock', () => {
    expect(formatMarkTime('2026-12-02T09:14:00Z', now, 'UTC')).toBe('Today 09:14');
    expect(formatMarkTime('2026-12-01T18:02:00Z', now, 'UTC')).toBe('Yesterday 18:02');
  });

  it('follows the time zone across midnight', () => {
    // 23:30 UTC on 1 Dec is already 2 Dec in Tokyo (UTC+9).
    expect(formatMarkTime('2026-12-01T23:30:00Z', now, 'Asia/Tokyo')).toBe('Today 08:30');
    expect(formatMarkTime('2026-12-01T23:30:00Z', now, 'UTC')).toBe('Yesterday 23:30');
  });

  it('writes older dates with the month, and the year when it differs', () => {
    expect(formatMarkTime('2026-11-20T07:05:00Z', now, 'UTC')).toBe('20 Nov, 07:05');
    expect(formatMarkTime('2025-11-20T07:05:00Z', now, 'UTC')).toBe('20 Nov 2025, 07:05');
  });

  it('returns text it cannot read unchanged', () => {
    expect(formatMarkTime('not a time', now, 'UTC')).toBe('not a time');
  });
});

describe('countUnread and order', () => {
  it('counts marks with something unread', () => {
    expect(countUnread([])).toBe(0);
    expect(countUnread([{ unread: true }, { unread: false }, { unread: true }])).toBe(2);
  });

  it('puts the newest mark first, ties in a stable order', () => {
    const a = { id: 'a', createdAt: '2026-11-01T00:00:00Z' };
    const b = { id: 'b', createdAt: '2026-11-03T00:00:00Z' };
    const c = { id: 'c', createdAt: '2026-11-01T00:00:00Z' };
    expect(sortNewestFirst([a, b, c]).map((m) => m.id)).toEqual(['b', 'a', 'c']);
  });

  it('tells an edit from the timestamps of one write', () => {
    expect(isEdited(mark({ updatedAt: '2026-11-30T08:00:00.020Z' }))).toBe(false);
    expect(isEdited(mark({ updatedAt: '2026-11-30T09:00:00.000Z' }))).toBe(true);
  });
});

describe('readReceipt', () => {
  it('tells staff whether the athlete read the mark', () => {
    expect(readReceipt(mark(), 'coach')).toEqual({ seen: false });
    expect(readReceipt(mark({ readByOtherAt: '2026-11-30T09:00:00Z' }), 'coach')).toEqual({
      seen: true,
      at: '2026-11-30T09:00:00Z',
    });
  });

  it('asks staff again after a staff reply or an edit the athlete has not read', () => {
    const read = '2026-11-30T09:00:00Z';
    expect(
      readReceipt(mark({ readByOtherAt: read, replies: [reply(COACH, '2026-11-30T10:00:00Z')] }), 'coach'),
    ).toEqual({ seen: false });
    expect(readReceipt(mark({ readByOtherAt: read, updatedAt: '2026-11-30T11:00:00Z' }), 'coach')).toEqual({
      seen: false,
    });
    // A reply by the athlete is not something the athlete has to read.
    expect(
      readReceipt(mark({ readByOtherAt: read, replies: [reply(ATHLETE, '2026-11-30T10:00:00Z')] }), 'coach'),
    ).toEqual({ seen: true, at: read });
  });

  it('tells the athlete only about their own replies', () => {
    expect(readReceipt(mark({ readByOtherAt: '2026-11-30T09:00:00Z' }), 'athlete')).toBeNull();
    const replied = mark({ replies: [reply(ATHLETE, '2026-11-30T10:00:00Z')] });
    expect(readReceipt(replied, 'athlete')).toEqual({ seen: false });
    expect(readReceipt({ ...replied, readByOtherAt: '2026-11-30T10:05:00Z' }, 'athlete')).toEqual({
      seen: true,
      at: '2026-11-30T10:05:00Z',
    });
  });
});

describe('visibleReplies', () => {
  const five = [1, 2, 3, 4, 5];

  it('shows the last few of a long thread until expanded', () => {
    expect(visibleReplies(five, false)).toEqual({ shown: [3, 4, 5], hidden: 2 });
    expect(visibleReplies(five, true)).toEqual({ shown: five, hidden: 0 });
  });

  it('shows a short thread whole', () => {
    expect(visibleReplies([1, 2], false)).toEqual({ shown: [1, 2], hidden: 0 });
  });
});
