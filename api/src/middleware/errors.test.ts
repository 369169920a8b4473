import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { zodFields } from './errors.js';

describe('zodFields', () => {
  it('keys issues by dot-joined path, first message per path', () => {
    const schema = z.object({
      event: z.object({
        date: z.string().min(10, 'Too short'),
        limits: z.array(z.number('Must be a number')),
      }),
      name: z.string().min(1, 'Name is required').min(2, 'Second rule'),
    });
    const result = schema.safeParse({ event: { date: 'x', limits: [1, 'two'] }, name: '' });
    expect(result.success).toBe(false);
    expect(zodFields(result.error!)).toEqual({
      fields: { 'event.date': 'Too short', 'event.limits.1': 'Must be a number', name: 'Name is required' },
    });
  });

  it('keeps a root issue out of the fields', () => {
    const result = z.object({ a: z.string() }).safeParse('not an object');
    expect(zodFields(result.error!)).toEqual({ fields: {}, rootMessage: expect.any(String) });
  });
});
