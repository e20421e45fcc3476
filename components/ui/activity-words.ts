import type { ActivityChange } from '../../shared/schemas/activity';
import { formatQuantity, type QuantityKind, type UnitSystem } from '../../shared/units';

/*
 * An activity entry keeps each changed field as it was stored: its path ("segments",
 * "options.1.limitOverride") and SI values. These words name the field the way the forms do and
 * give each measured value in the reader's units, so "segments: [{"lengthMm":600,…}]" reads
 * "Segments: 23.62 in, 1508 → 1292 °F". The kind of a value follows its key's SI suffix.
 */

const MAX_CHARS = 120;

const WORDS: Record<string, string> = {
  od: 'OD',
  temp: 'temperature',
  id: 'ID',
  uns: 'UNS',
  pct: '%',
};

const KEY_LABELS: Record<string, string> = {
  installTempC: 'Install temperature',
  startTempC: 'start',
  endTempC: 'end',
  lengthMm: 'length',
  nearby: 'Nearby parts',
  runs: 'Run order',
  from: 'Copied from',
  customerEmail: 'Sent to',
};

/** What a key measures, from its suffix: …Mm a length, …C a temperature (a margin is a difference), …Kg a mass. */
export function kindOfKey(key: string): QuantityKind | null {
  if (/Mm$/.test(key)) {
    if (/clearance|tolerance|scale/i.test(key)) return 'fit';
    if (/gap|engagement|offset|growth|wall|extension|compression|movement/i.test(key)) return 'smallLength';
    return 'length';
  }
  if (/[a-z]C$/.test(key)) return /margin/i.test(key) ? 'temperatureDelta' : 'temperature';
  if (/Kg$/.test(key)) return 'mass';
  return null;
}

/** "startTempC" → "start temperature", "odMm" → "OD"; a known key has its form's label. */
export function labelOfKey(key: string): string {
  if (KEY_LABELS[key]) return KEY_LABELS[key];
  const bare = key.replace(/(Mm|Kg|Id)$/, '').replace(/([a-z])C$/, '$1');
  return bare
    .split(/(?=[A-Z])/)
    .map((w) => WORDS[w.toLowerCase()] ?? w.toLowerCase())
    .join(' ');
}

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "options.1.limitOverride" → "Option 2 limit override"; "tube" → "Tube". */
export function labelOfPath(path: string): string {
  const parts = path.split('.');
  const words = parts.map((p, i) => (/^\d+$/.test(p) ? String(Number(p) + 1) : i === 0 && parts.length > 1 ? labelOfKey(p).replace(/s$/, '') : labelOfKey(p)));
  return capital(words.join(' '));
}

const isIdKey = (key: string) => /Id$/.test(key);

/** One value in the reader's units: numbers by their key's kind, lists and records worded part by part. */
export function wordValue(value: unknown, units: UnitSystem, key = ''): string {
  if (value === null || value === undefined || value === '') return '—';
  if (typeof value === 'number') {
    const kind = kindOfKey(key);
    if (kind) return formatQuantity(kind, value, units).text;
    return /Pct$/.test(key) ? `${value} %` : String(value);
  }
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'string') return value;
  if (Array.isArray(value)) return value.length === 0 ? 'none' : value.map((v) => wordValue(v, units, key)).join('; ');
  if (typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([k, v]) => !isIdKey(k) && v !== null && v !== undefined && v !== '');
    return entries.map(([k, v]) => `${labelOfKey(k)} ${wordValue(v, units, k)}`).join(', ') || '—';
  }
  return String(value);
}

const cut = (text: string) => (text.length > MAX_CHARS ? `${text.slice(0, MAX_CHARS - 1)}…` : text);

/** The line for one change: "Install temperature: 68 °F → 77 °F"; a changed reference (an alloy) is named, not its id. */
export function wordChange(change: ActivityChange, units: UnitSystem): string {
  const last = change.path.split('.').pop() ?? change.path;
  if (isIdKey(last)) return `${labelOfPath(change.path)} changed`;
  return `${labelOfPath(change.path)}: ${cut(wordValue(change.before, units, last))} → ${cut(wordValue(change.after, units, last))}`;
}
