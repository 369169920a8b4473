/**
 * Client-generated ids for creates. One id belongs to one submission: it is made when the athlete
 * first presses the button and reused when the same submission is sent again (a retry after a
 * lost answer, a second tap while the first is on its way), so the server returns the first entry
 * instead of storing a second. Only a success ends the submission; the next one gets a new id.
 */
export function newClientId(): string {
  const c = globalThis.crypto;
  if (c && typeof c.randomUUID === 'function') return c.randomUUID();
  // randomUUID exists only in secure contexts (https, localhost); plain http on a LAN lacks it.
  const bytes = new Uint8Array(16);
  c.getRandomValues(bytes);
  bytes[6] = (bytes[6]! & 0x0f) | 0x40;
  bytes[8] = (bytes[8]! & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

export interface ClientIdKeeper {
  /**
   * The id for the submission being sent. With a `key` (what the submission is, e.g. "+250 mL
   * water"), a different key starts a new submission; without one, every call until `settle()`
   * is the same submission (a form being retried).
   */
  take(key?: string): string;
  /** The submission succeeded: the next `take()` starts a new one. */
  settle(id?: string): void;
  /** The id of the unsettled submission, if any. */
  readonly pending: string | null;
}

export function createClientIdKeeper(makeId: () => string = newClientId): ClientIdKeeper {
  let current: { id: string; key: string | undefined } | null = null;
  return {
    take(key) {
      if (!current || (key !== undefined && current.key !== key)) current = { id: makeId(), key };
      return current.id;
    },
    settle(id) {
      // A late answer to an older submission must not end a newer one.
      if (current && (id === undefined || id === current.id)) current = null;
    },
    get pending() {
      return current?.id ?? null;
    },
  };
}
