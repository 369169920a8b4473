/**
 * The pure half of the reliability run (`scripts/src/lib/reliability.ts`): what a client sent and
 * was told, set against what the database holds, becomes one line per scenario and a verdict.
 */

/** One logical write as the client saw it (all its attempts, retries and duplicates included). */
export interface WriteRecord {
  /** What identifies the write in the database: a client id, a content hash, a message id. */
  key: string;
  /** HTTP requests sent for this write (first try, duplicates, retries after an abort or a 503). */
  sent: number;
  /** Whether any attempt got a 2xx answer. */
  acknowledged: boolean;
}

export interface ScenarioResult {
  name: string;
  sent: number;
  acknowledged: number;
  /** Writes found in the database (acknowledged or not: an aborted request may still have landed). */
  present: number;
  /** Acknowledged writes the database does not hold. */
  lost: number;
  /** Writes held more than once where the design promises exactly once. */
  duplicated: number;
  /** Answers 500–599, and among them the 503s that carried Retry-After and the error shape. */
  serverErrors: number;
  unavailable503: number;
  /** Anything else that fails the run (a 500, an orphan file, an exit code), one line each. */
  problems: string[];
  /** Facts worth printing that do not fail the run (at-least-once repeats, refused connections). */
  notes: string[];
}

/**
 * Counts writes against the rows found: `rowCounts` maps a write's key to how many rows hold it.
 * `exactlyOnce` says whether a second row for one key is a defect (client ids, photo hashes) or
 * an accepted repeat (mail, which stays at least once).
 */
export function tally(
  name: string,
  writes: readonly WriteRecord[],
  rowCounts: ReadonlyMap<string, number>,
  exactlyOnce: boolean,
): ScenarioResult {
  let sent = 0;
  let acknowledged = 0;
  let present = 0;
  let lost = 0;
  let duplicated = 0;
  for (const write of writes) {
    sent += write.sent;
    const rows = rowCounts.get(write.key) ?? 0;
    if (write.acknowledged) acknowledged += 1;
    if (rows > 0) present += 1;
    if (write.acknowledged && rows === 0) lost += 1;
    if (rows > 1) duplicated += 1;
  }
  const problems: string[] = [];
  if (lost > 0) problems.push(`${lost} acknowledged write(s) missing from the database`);
  if (exactlyOnce && duplicated > 0) problems.push(`${duplicated} write(s) stored more than once`);
  return {
    name,
    sent,
    acknowledged,
    present,
    lost,
    duplicated,
    serverErrors: 0,
    unavailable503: 0,
    problems,
    notes: [],
  };
}

/** A scenario fails on any problem: a loss, a promised-once duplicate, a 500, an orphan, an exit. */
export function scenarioFailed(result: ScenarioResult): boolean {
  return result.problems.length > 0;
}

/** `a. writes …  sent 3100 / acknowledged 3000 / present 3004 / lost 0 / duplicated 0 / 5xx 0`. */
export function formatResult(result: ScenarioResult): string {
  const fivexx =
    result.unavailable503 > 0
      ? `${result.serverErrors} (503 with Retry-After: ${result.unavailable503})`
      : String(result.serverErrors);
  const head =
    `${scenarioFailed(result) ? 'FAIL' : 'ok  '} ${result.name}: sent ${result.sent} / acknowledged ` +
    `${result.acknowledged} / present ${result.present} / lost ${result.lost} / duplicated ` +
    `${result.duplicated} / 5xx ${fivexx}`;
  const lines = [head, ...result.notes.map((n) => `       ${n}`)];
  lines.push(...result.problems.map((p) => `       problem: ${p}`));
  return lines.join('\n');
}

const CRC_TABLE = (() => {
  const table = new Uint32Array(256);
  for (let n = 0; n < 256; n += 1) {
    let c = n;
    for (let k = 0; k < 8; k += 1) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c >>> 0;
  }
  return table;
})();

/** CRC-32 as PNG chunks use it (ISO 3309 / ITU-T V.42 polynomial; PNG spec, W3C 2003, annex D). */
export function crc32(data: Uint8Array): number {
  let c = 0xffffffff;
  for (const byte of data) c = CRC_TABLE[(c ^ byte) & 0xff]! ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
