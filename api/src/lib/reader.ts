import type { Reader } from '@driftmark/shared';
import type { User } from '../entities/user.entity.js';

/**
 * The reader of a text about `athlete`: the signed-in user's units, and the athlete's name when the
 * reader is someone else (staff wording: "Mateo's countdown").
 */
export function readerOf(
  user: Pick<User, 'id' | 'weightUnit' | 'volumeUnit'>,
  athlete: { userId: string; user: { name: string } },
): Reader {
  return {
    units: { weight: user.weightUnit, volume: user.volumeUnit },
    aboutAthlete: user.id === athlete.userId ? null : athlete.user.name,
  };
}
