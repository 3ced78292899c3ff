// The price book as CSV (papaparse both ways). Prices appear as decimals in currency units,
// exact to 5 places (millicents); roll widths as `12;15`. Column names are the contract for
// spreadsheets people keep, so change them only with a migration note in the README.
import Papa from 'papaparse';
import {
  MILLICENTS_PER_UNIT,
  priceBookItemInputSchema,
  type PriceBookImportRowError,
  type PriceBookItemData,
  type PriceBookItemView,
} from '@seamwright/shared';

export const priceBookCsvColumns = [
  'kind',
  'key',
  'name',
  'unit',
  'packSize',
  'price',
  'pileHeightIn',
  'rollWidthsFt',
  'maxRollLengthFt',
  'recommendedInfill',
  'infillRateLbPerSqFt',
  'labourBasis',
  'isStarter',
] as const;
type Column = (typeof priceBookCsvColumns)[number];
export type CsvRecord = Partial<Record<Column, string>> & Record<string, string>;

/** 235000 → "2.35"; exact, no floating point. */
export function formatMillicents(millicents: number): string {
  const whole = Math.floor(millicents / MILLICENTS_PER_UNIT);
  const fraction = String(millicents % MILLICENTS_PER_UNIT)
    .padStart(5, '0')
    .replace(/0+$/, '');
  return fraction ? `${whole}.${fraction.padEnd(2, '0')}` : `${whole}.00`;
}

/** "2.35" → 235000, or null when the text is not a plain non-negative decimal (≤ 5 places). */
export function parseMillicents(text: string): number | null {
  const match = /^(\d{1,9})(?:\.(\d{0,5}))?$/.exec(text.trim().replace(/^\$/, ''));
  if (!match) return null;
  return Number(match[1]) * MILLICENTS_PER_UNIT + Number((match[2] ?? '').padEnd(5, '0'));
}

function toRecord(item: PriceBookItemView): Record<Column, string> {
  const turf = item.kind === 'turf' ? item.attributes : null;
  return {
    kind: item.kind,
    key: item.key,
    name: item.name,
    unit: item.unit,
    packSize: item.packSize === null ? '' : String(item.packSize),
    price: formatMillicents(item.priceMillicents),
    pileHeightIn: turf ? String(turf.pileHeightIn) : '',
    rollWidthsFt: turf ? turf.rollWidthsFt.join(';') : '',
    maxRollLengthFt: turf ? String(turf.maxRollLengthFt) : '',
    recommendedInfill: turf?.recommendedInfill ?? '',
    infillRateLbPerSqFt: turf?.infillRateLbPerSqFt == null ? '' : String(turf.infillRateLbPerSqFt),
    labourBasis: item.kind === 'labour' ? item.attributes.basis : '',
    isStarter: item.isStarter ? 'yes' : 'no',
  };
}

export function priceBookToCsv(items: PriceBookItemView[]): string {
  return Papa.unparse(items.map(toRecord), { columns: [...priceBookCsvColumns], newline: '\r\n' });
}

export interface ParsedCsv {
  records: CsvRecord[];
  /** Problems with the file as a whole (a missing column, broken quoting). */
  fileErrors: string[];
}

export function parsePriceBookCsv(csv: string): ParsedCsv {
  const result = Papa.parse<CsvRecord>(csv.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (header) => header.trim(),
  });
  const headers = result.meta.fields ?? [];
  const fileErrors = ['kind', 'key', 'name', 'unit', 'price']
    .filter((column) => !headers.includes(column))
    .map((column) => `The file has no "${column}" column`);
  for (const error of result.errors)
    if (error.type === 'Quotes') fileErrors.push(`Line ${(error.row ?? 0) + 2}: ${error.message}`);
  return { records: result.data, fileErrors };
}

const number = (text: string | undefined): number | null => {
  const trimmed = (text ?? '').trim();
  return trimmed === '' ? null : Number(trimmed);
};

/** Where the item schema's path points, in the CSV's column names. */
const columnOfPath: Record<string, Column> = {
  priceMillicents: 'price',
  'attributes.basis': 'labourBasis',
  'attributes.pileHeightIn': 'pileHeightIn',
  'attributes.rollWidthsFt': 'rollWidthsFt',
  'attributes.maxRollLengthFt': 'maxRollLengthFt',
  'attributes.recommendedInfill': 'recommendedInfill',
  'attributes.infillRateLbPerSqFt': 'infillRateLbPerSqFt',
};

/** One CSV row → a validated item, or the errors per column. */
export function itemFromCsvRecord(record: CsvRecord): {
  item: PriceBookItemData | null;
  errors: PriceBookImportRowError[];
} {
  const errors: PriceBookImportRowError[] = [];
  const kind = (record.kind ?? '').trim();
  const priceText = record.price ?? '';
  const priceMillicents = parseMillicents(priceText);
  if (priceMillicents === null)
    errors.push({ field: 'price', message: 'Enter a price like 2.35 (up to 5 decimal places)' });
  const starter = (record.isStarter ?? '').trim().toLowerCase();
  const candidate = {
    kind,
    key: record.key ?? '',
    name: record.name ?? '',
    unit: record.unit ?? '',
    packSize: number(record.packSize),
    priceMillicents: priceMillicents ?? 0,
    isStarter: starter === 'yes' || starter === 'true',
    attributes:
      kind === 'turf'
        ? {
            pileHeightIn: number(record.pileHeightIn),
            rollWidthsFt: (record.rollWidthsFt ?? '')
              .split(';')
              .filter((part) => part.trim() !== '')
              .map(Number),
            maxRollLengthFt: number(record.maxRollLengthFt),
            recommendedInfill: (record.recommendedInfill ?? '').trim() || null,
            infillRateLbPerSqFt: number(record.infillRateLbPerSqFt),
          }
        : kind === 'labour'
          ? { basis: (record.labourBasis ?? '').trim() }
          : {},
  };
  const parsed = priceBookItemInputSchema.safeParse(candidate);
  if (parsed.success && errors.length === 0) return { item: parsed.data, errors: [] };
  if (!parsed.success)
    for (const issue of parsed.error.issues) {
      const path = issue.path.map(String).join('.');
      const field = columnOfPath[path] ?? (path.split('.')[0] || 'row');
      const message =
        field === 'kind' ? `Use one of turf, material, labour, equipment, disposal` : issue.message;
      if (!errors.some((e) => e.field === field)) errors.push({ field, message });
    }
  return { item: null, errors };
}
