import type { DiffEntry } from '../../shared/catalogue/alloy-diff';
import type { SourceView } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import {
  familyLabel,
  formatCte,
  formatDensity,
  formatModulus,
  formatPrice,
  formatStress,
  formatTemp,
  formatTempRange,
  sourceLabel,
} from './format';

export interface DiffLine {
  label: string;
  before: string;
  after: string;
}

type Sources = Map<string, SourceView>;

const LABELS: Record<string, string> = {
  designation: 'Designation',
  uns: 'UNS number',
  family: 'Family',
  densityKgM3: 'Density',
  densitySourceId: 'Source of the density',
  maxContinuousC: 'Continuous service limit',
  maxIntermittentC: 'Intermittent service limit',
  limitsSourceId: 'Source of the service limits',
  pricePerKg: 'Price',
  currency: 'Currency',
  priceSetOn: 'Price set on',
  priceIsDemo: 'Demo price',
  referenceTempC: 'Reference temperature of the mean CTE',
  notes: 'Notes',
  dataCautions: 'Data cautions',
  warningRanges: 'Warning ranges',
  status: 'Status',
  datasheets: 'Data sheets',
};

const TABLE_LABELS = { cte: 'Mean CTE', modulus: 'Elastic modulus', yield: '0.2 % yield strength' } as const;
type Table = keyof typeof TABLE_LABELS;

/** Shown for a value that was not there before (or is gone after). */
export const NONE = '—';

function tableValue(table: Table, value: number, units: UnitSystem): string {
  if (table === 'cte') return formatCte(value, units);
  if (table === 'modulus') return formatModulus(value, units);
  return formatStress(value, units);
}

function scalar(path: string, value: unknown, sources: Sources, units: UnitSystem): string {
  if (value === null || value === undefined || value === '') return NONE;
  switch (path) {
    case 'densityKgM3':
      return formatDensity(Number(value), units);
    case 'maxContinuousC':
    case 'maxIntermittentC':
    case 'referenceTempC':
      return formatTemp(Number(value), units);
    case 'pricePerKg':
      return formatPrice(Number(value), '', units).replace(' /', ' per ');
    case 'family':
      return familyLabel(value as never);
    case 'priceIsDemo':
      return value ? 'Yes' : 'No';
    case 'densitySourceId':
    case 'limitsSourceId':
      return sourceLabel(sources.get(String(value)));
    case 'warningRanges':
      return Array.isArray(value) && value.length > 0
        ? value
            .map((w: { fromC: number; toC: number; message: string }) => `${formatTempRange(w.fromC, w.toC, units)}: ${w.message}`)
            .join('; ')
        : 'None';
    case 'datasheets': {
      const sheet = value as { name?: string };
      return sheet.name ?? 'A data sheet';
    }
    default:
      return typeof value === 'object' ? JSON.stringify(value) : String(value);
  }
}

/** One change in words and units: "Density: 7920 kg/m³ → 7930 kg/m³", a table point by temperature. */
export function describeDiff(entry: DiffEntry, sources: Sources, units: UnitSystem): DiffLine {
  const point = /^(cte|modulus|yield)@(-?[\d.]+) °C$/.exec(entry.path);
  if (point) {
    const table = point[1] as Table;
    const show = (side: unknown) => {
      if (!side) return NONE;
      const { value, sourceId } = side as { value: number; sourceId: string };
      return `${tableValue(table, value, units)} (${sourceLabel(sources.get(sourceId))})`;
    };
    return {
      label: `${TABLE_LABELS[table]} at ${formatTemp(Number(point[2]), units)}`,
      before: show(entry.before),
      after: show(entry.after),
    };
  }
  return {
    label: LABELS[entry.path] ?? entry.path,
    before: scalar(entry.path, entry.before, sources, units),
    after: scalar(entry.path, entry.after, sources, units),
  };
}

export function sourceMap(sources: SourceView[] | undefined): Sources {
  return new Map((sources ?? []).map((s) => [s.id, s]));
}
