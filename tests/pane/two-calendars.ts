/**
 * Two price histories on two calendars, made from the demo data (our own seeded generator,
 * addin/demo/data/quennel-delta.csv): GateGasoil keeps every demo date but every 7th; DockDiesel
 * keeps every date but every 11th, plus one Saturday of its own. Laid out as the pane meets them
 * in a sheet: Date A | GateGasoil | Date B | DockDiesel, the shorter calendar blank at its foot.
 */
import { DEMO_CSV } from '../pane-workbook/demo-block';

/** The demo's dates and the two prices, by row. */
export function demoRows(): { date: string; gasoil: number; diesel: number }[] {
  const [head, ...lines] = DEMO_CSV.trimEnd().split('\n');
  const h = head.split(',');
  const at = (name: string) => h.indexOf(name);
  return lines.map((l) => {
    const f = l.split(',');
    return { date: f[at('Date')], gasoil: Number(f[at('GateGasoil')]), diesel: Number(f[at('DockDiesel')]) };
  });
}

/** The two calendars as separate lists of [date, price]. */
export function twoCalendars(): { a: [string, number][]; b: [string, number][] } {
  const rows = demoRows();
  const a = rows.filter((_, i) => i % 7 !== 3).map((r) => [r.date, r.gasoil] as [string, number]);
  const b: [string, number][] = rows.filter((_, i) => i % 11 !== 5).map((r) => [r.date, r.diesel] as [string, number]);
  const at = b.findIndex((r) => r[0] > '2022-03-05');
  b.splice(at, 0, ['2022-03-05', b[at - 1][1]]); // a Saturday only the second vendor quotes (2022-03-04 is a Friday)
  return { a, b };
}

/** The two calendars side by side as CSV text. */
export function twoCalendarCsv(): string {
  const { a, b } = twoCalendars();
  const lines = ['Date A,GateGasoil,Date B,DockDiesel'];
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    lines.push([a[i]?.[0] ?? '', a[i]?.[1] ?? '', b[i]?.[0] ?? '', b[i]?.[1] ?? ''].join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** The dates both calendars hold, found directly (the independent side of the checks). */
export function sharedDates(): string[] {
  const { a, b } = twoCalendars();
  const inB = new Set(b.map((r) => r[0]));
  return a.map((r) => r[0]).filter((d) => inB.has(d)).sort();
}
