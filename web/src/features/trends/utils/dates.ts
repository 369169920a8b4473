const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

function toUtc(isoDate: string): Date {
  const m = ISO_DATE.exec(isoDate);
  if (!m) throw new RangeError(`Not a YYYY-MM-DD date: ${isoDate}`);
  return new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
}

/** A calendar date moved by whole days (dates are labels, not instants: no time zone involved). */
export function addDays(isoDate: string, days: number): string {
  const d = toUtc(isoDate);
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** Whole days from `from` to `to`; negative when `to` is earlier. */
export function dayDiff(from: string, to: string): number {
  return Math.round((toUtc(to).getTime() - toUtc(from).getTime()) / 86_400_000);
}

/** Every date from `from` to `to`, both included (empty when `to` is earlier). */
export function eachDay(from: string, to: string): string[] {
  const out: string[] = [];
  for (let d = from; d <= to; d = addDays(d, 1)) out.push(d);
  return out;
}
