import type { AlloyFamily, SourceView } from '../../shared/schemas/alloy';
import { FAMILY_LABELS } from '../../shared/schemas/alloy';
import { formatQuantity, type QuantityKind, unitLabel, type UnitSystem } from '../../shared/units';

export const formatTemp = (c: number, units: UnitSystem) => formatQuantity('temperature', c, units).text;
export const formatGrowth = (mmPerM: number, units: UnitSystem) => formatQuantity('growthPerLength', mmPerM, units).text;
export const formatStress = (mpa: number, units: UnitSystem) => formatQuantity('stress', mpa, units).text;

export const formatDensity = (kgM3: number, units: UnitSystem) => formatQuantity('density', kgM3, units).text;
export const formatModulus = (gpa: number, units: UnitSystem) => formatQuantity('modulus', gpa, units).text;
export const formatCte = (umPerMK: number, units: UnitSystem) => formatQuantity('cte', umPerMK, units).text;

export const cteUnit = (units: UnitSystem) => unitLabel('cte', units);
export const unitOf = (kind: QuantityKind, units: UnitSystem) => unitLabel(kind, units);
export const densityUnit = (units: UnitSystem) => unitLabel('density', units);

/** "4.20 EUR/kg" / "1.91 EUR/lb". */
export function formatPrice(perKg: number, currency: string, units: UnitSystem): string {
  const f = formatQuantity('pricePerMass', perKg, units);
  return `${f.value.toFixed(2)} ${currency}/${units === 'metric' ? 'kg' : 'lb'}`;
}

export const familyLabel = (family: AlloyFamily) => FAMILY_LABELS[family] ?? family;

/** "1.3 MB", for file sizes. */
export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(0)} kB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' });
}

/** A temperature span for warnings, e.g. "425–815 °C". */
export function formatTempRange(fromC: number, toC: number, units: UnitSystem): string {
  const a = formatQuantity('temperature', fromC, units);
  const b = formatQuantity('temperature', toC, units);
  return `${a.value}–${b.text}`;
}

export function sourceLabel(source: SourceView | undefined): string {
  if (!source) return 'Unknown source';
  return [source.title, source.issuer, source.edition].filter(Boolean).join(', ');
}
