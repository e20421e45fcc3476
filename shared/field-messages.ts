import { formatQuantity, type QuantityKind, type UnitSystem } from './units';

/*
 * The schemas and the engine's input checks state their bounds in SI figures inside the message
 * ("Outside diameter must be at most 2000 mm", "900 °C is above the expansion data (max 870 °C)"):
 * the server sends them in its one error shape, `{error:{code,message,fields}}`, and a client
 * reads the same text from its own zod check. Every bound is written as a number followed by
 * "mm" or "°C", so the number is the SI value and the unit says its kind: the field that shows the
 * message words it in the reader's units, at the precision of its own quantity.
 */
// "mm/m" (a growth per length) is not a length, hence the look-ahead.
// Messages write a negative bound with the minus sign (−50 °C) as often as with a hyphen.
const SI_FIGURE = /([-−]?\d+(?:\.\d+)?) ?(mm|°C)(?![\w/²³])/g;

const LENGTH_KINDS: readonly QuantityKind[] = ['length', 'smallLength', 'fit'];

/**
 * A field message with its SI bounds in the reader's units: "at most 300 mm" reads "at most
 * 11.81 in" in an imperial length field. A length uses the field's own kind (a wall at 0.001 in,
 * a tube length at 0.01 in); a temperature is a level. Metric readers get the text unchanged.
 */
export function wordFieldMessage(message: string, system: UnitSystem, fieldKind?: QuantityKind): string {
  if (system === 'metric') return message;
  const lengthKind = fieldKind && LENGTH_KINDS.includes(fieldKind) ? fieldKind : 'length';
  return message.replace(SI_FIGURE, (_whole, figure: string, unit: string) =>
    formatQuantity(unit === 'mm' ? lengthKind : 'temperature', Number(figure.replace('−', '-')), system).text,
  );
}
