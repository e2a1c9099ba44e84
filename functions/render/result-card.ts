/**
 * The labelled rows of a result as an entity value: a card the user opens from the cell, whose
 * fields a formula can read by key (=A1.pValue, =A1.statistic).
 *
 * Shape: Excel.EntityCellValue with one property per row (Double, String or Boolean cell
 * values) and a card layout listing them in sections ("Excel.EntityCellValue interface";
 * "Use data types with custom functions in Excel"). Returning entities needs the
 * allowCustomDataForDataTypeAny flag in functions.json, which the metadata generator sets, and
 * CustomFunctionsRuntime 1.4 in the host ("Custom Functions requirement sets": 1.4 brings the
 * data-types integration); hostShowsCards checks the latter.
 */
import type { ResultRow } from './result-rows';

/** Keys shown first on the card, under the title. */
const SUMMARY_KEYS = ['verdict', 'statistic', 'pValue', 'pValueReads', 'pValueNote', 'decision5'];
/** Keys that say how the test was run. */
const SETUP_KEYS = ['nullHypothesis', 'alternative', 'lags', 'lagRule', 'bandwidth', 'observations', 'deterministic'];

function propertyOf(row: ResultRow): Excel.EntityPropertyType {
  if (typeof row.value === 'number') return { type: 'Double', basicValue: row.value } as Excel.DoubleCellValue;
  if (typeof row.value === 'boolean') return { type: 'Boolean', basicValue: row.value } as Excel.BooleanCellValue;
  return { type: 'String', basicValue: row.value } as Excel.StringCellValue;
}

/** The rows as an entity: `text` is what the cell shows before the card is opened. */
export function resultCard(rows: readonly ResultRow[], text: string): Excel.EntityCellValue {
  const properties: Record<string, Excel.EntityPropertyType> = {};
  for (const row of rows) properties[row.key] = propertyOf(row);
  const keys = rows.map((r) => r.key);
  const pick = (wanted: readonly string[]) => keys.filter((k) => wanted.includes(k));
  const summary = pick(SUMMARY_KEYS).concat(keys.filter((k) => k.startsWith('critical')));
  const setup = pick(SETUP_KEYS);
  const closing = keys.filter((k) => k.startsWith('warning') || k === 'caution');
  const details = keys.filter((k) => k !== 'title' && !summary.includes(k) && !setup.includes(k) && !closing.includes(k));
  const sections: Excel.CardLayoutSection[] = [
    { layout: 'List', properties: summary },
    { layout: 'List', title: 'How it was run', collapsible: true, collapsed: true, properties: setup },
    { layout: 'List', title: 'Details', collapsible: true, collapsed: true, properties: details },
    { layout: 'List', title: 'Warnings and caution', collapsible: true, collapsed: false, properties: closing },
  ].filter((s) => s.properties.length > 0) as Excel.CardLayoutSection[];
  return {
    type: 'Entity',
    text,
    properties,
    layouts: { card: { title: { property: 'title' }, sections } },
  } as Excel.EntityCellValue;
}

/** True when the host can show entity values returned by a custom function (CustomFunctionsRuntime 1.4). */
export function hostShowsCards(): boolean {
  const office = (globalThis as { Office?: { context?: { requirements?: { isSetSupported(name: string, version?: string): boolean } } } }).Office;
  try {
    return office?.context?.requirements?.isSetSupported('CustomFunctionsRuntime', '1.4') === true;
  } catch {
    return false;
  }
}
