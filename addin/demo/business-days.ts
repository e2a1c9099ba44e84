/**
 * Consecutive weekdays as ISO dates (yyyy-mm-dd), starting on a given date.
 *
 * The demo calendar has no holidays: an invented market needs no real holiday list, and a
 * gap-free weekday calendar keeps "one row = one trading day" exact for the lag arithmetic.
 * Dates are computed in UTC so the result does not depend on the machine's time zone.
 */
export function businessDays(startIso: string, count: number): string[] {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(startIso);
  if (!match) throw new Error(`start date '${startIso}' is not yyyy-mm-dd`);
  const day = new Date(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])));
  const out: string[] = [];
  while (out.length < count) {
    const weekday = day.getUTCDay(); // 0 = Sunday, 6 = Saturday
    if (weekday !== 0 && weekday !== 6) out.push(day.toISOString().slice(0, 10));
    day.setUTCDate(day.getUTCDate() + 1);
  }
  return out;
}
