import { createHash } from 'node:crypto';
import type { RecoveryItemKind } from '@driftmark/shared';

/** A fixed namespace for recovery items' ids (RFC 9562 §5.5: any uuid chosen once). */
const NAMESPACE = 'a3f1c2e4-5b6d-4e7f-8a9b-0c1d2e3f4a5b';

/** A name-based uuid, version 5 (SHA-1), RFC 9562 §5.5. */
export function uuidV5(namespace: string, name: string): string {
  const ns = Buffer.from(namespace.replace(/-/g, ''), 'hex');
  const bytes = createHash('sha1')
    .update(Buffer.concat([ns, Buffer.from(name, 'utf8')]))
    .digest()
    .subarray(0, 16);
  bytes[6] = (bytes[6]! & 0x0f) | 0x50;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/**
 * The client id a recovery item logs its entry with: a version-5 uuid of the athlete, the
 * weigh-in date, the slot and the item, so every device ticking the same item sends the same id
 * and the entry tables' unique (athlete_id, client_id) index keeps one entry.
 */
export function recoveryClientId(
  athleteId: string,
  weighInDate: string,
  slotIndex: number,
  kind: RecoveryItemKind,
): string {
  return uuidV5(NAMESPACE, `recovery:${athleteId}:${weighInDate}:${slotIndex}:${kind}`);
}
