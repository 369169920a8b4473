import { describe, expect, it } from 'vitest';
import { recoveryClientId, uuidV5 } from './recovery-client-id.js';

describe('uuidV5', () => {
  it('matches the RFC 9562 test vector', () => {
    // RFC 9562 Appendix A.4: DNS namespace, "www.example.com" (also Python's uuid.uuid5).
    expect(uuidV5('6ba7b810-9dad-11d1-80b4-00c04fd430c8', 'www.example.com')).toBe(
      '2ed6657d-e927-568b-95e1-2665a8aea6a2',
    );
  });
});

describe('recoveryClientId', () => {
  const athlete = '0b6b4f0e-3c7a-4e8e-9a55-7f1f4c2d9e10';
  it('is the same for the same item and differs between items, slots and weigh-ins', () => {
    const id = recoveryClientId(athlete, '2026-03-14', 0, 'fluid');
    expect(recoveryClientId(athlete, '2026-03-14', 0, 'fluid')).toBe(id);
    expect(recoveryClientId(athlete, '2026-03-14', 0, 'carbohydrate')).not.toBe(id);
    expect(recoveryClientId(athlete, '2026-03-14', 1, 'fluid')).not.toBe(id);
    expect(recoveryClientId(athlete, '2026-03-21', 0, 'fluid')).not.toBe(id);
    expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-5[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });
});
