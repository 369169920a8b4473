import { describe, expect, it } from 'vitest';
import { withEntry } from './day-cache';

// The server lists a day's entries by time, then by when they were made
// (api/src/repositories/day-entry.repository.ts, listForDay); the patched cache keeps that order.
const e = (id: string, time: string, note = '') => ({ id, time, note });

describe('withEntry', () => {
  it('adds a new entry in time order, after those made earlier at the same minute', () => {
    const list = [e('a', '08:00'), e('b', '12:00')];
    expect(withEntry(list, e('c', '08:00')).map((x) => x.id)).toEqual(['a', 'c', 'b']);
    expect(withEntry(list, e('d', '07:00')).map((x) => x.id)).toEqual(['d', 'a', 'b']);
    expect(list.map((x) => x.id)).toEqual(['a', 'b']);
  });

  it('replaces an edited entry by its id and moves it to its new time', () => {
    const list = [e('a', '08:00'), e('b', '12:00')];
    expect(withEntry(list, e('a', '13:00', 'edited'))).toEqual([e('b', '12:00'), e('a', '13:00', 'edited')]);
  });
});
