import type { AlloyFamily, SourceView } from '../../shared/schemas/alloy';
import { FAMILY_LABELS } from '../../shared/schemas/alloy';
import {
  cteMetricToImperial,
  formatQuantity,
  kgToLb,
  mmToIn,
  type QuantityKind,
  toDisplay,
  unitLabel,
  type UnitSystem,
} from '../../shared/units';

/**
 * The alloy form and review enter and check catalogue data in metric, the units its sources
 * publish (the property tables are typed as the data sheet gives them); the catalogue's reading
 * screens follow the user's units.
 */
export const CATALOGUE_UNITS: UnitSystem = 'metric';

export const formatTemp = (c: number, units: UnitSystem) => formatQuantity('temperature', c, units).text;
export const formatGrowth = (mmPerM: number, units: UnitSystem) => formatQuantity('growthPerLength', mmPerM, units).text;
export const formatStress = (mpa: number, units: UnitSystem) => formatQuantity('stress', mpa, units).text;

/** Units shared/units.ts has no kind for yet: density, modulus and the mean coefficient. */
const LB_PER_IN3_PER_KG_PER_M3 = kgToLb(1) / mmToIn(1000) ** 3;

export function formatDensity(kgM3: number, units: UnitSystem): string {
  return units === 'metric' ? `${Math.round(kgM3)} kg/m³` : `${(kgM3 * LB_PER_IN3_PER_KG_PER_M3).toFixed(3)} lb/in³`;
}

export function formatModulus(gpa: number, units: UnitSystem): string {
  return units === 'metric' ? `${gpa.toFixed(0)} GPa` : `${((toDisplay('stress', gpa * 1000, units)) / 1000).toFixed(1)} Msi`;
}

export function formatCte(umPerMK: number, units: UnitSystem): string {
  return units === 'metric' ? `${umPerMK.toFixed(2)} µm/m·K` : `${cteMetricToImperial(umPerMK).toFixed(2)} µin/in·°F`;
}

export const cteUnit = (units: UnitSystem) => (units === 'metric' ? 'µm/m·K' : 'µin/in·°F');
export const unitOf = (kind: QuantityKind, units: UnitSystem) => unitLabel(kind, units);
export const densityUnit = (units: UnitSystem) => (units === 'metric' ? 'kg/m³' : 'lb/in³');

export function formatPrice(perKg: number, currency: string, units: UnitSystem): string {
  const perUnit = units === 'metric' ? perKg : perKg / kgToLb(1);
  return `${perUnit.toFixed(2)} ${currency}/${units === 'metric' ? 'kg' : 'lb'}`;
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
