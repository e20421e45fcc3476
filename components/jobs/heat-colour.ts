import { heatScale } from '../../constants/theme';

const hex = (c: string) => [1, 3, 5].map((i) => parseInt(c.slice(i, i + 2), 16));
const toHex = (rgb: number[]) => `#${rgb.map((v) => Math.round(v).toString(16).padStart(2, '0')).join('')}`;

/** The heat scale's colour at a temperature, mixed between its stops and held beyond its ends. */
export function heatColour(tempC: number): string {
  const stops = heatScale;
  if (tempC <= stops[0].atC) return stops[0].color;
  for (let i = 1; i < stops.length; i++) {
    const a = stops[i - 1];
    const b = stops[i];
    if (tempC <= b.atC) {
      const t = (tempC - a.atC) / (b.atC - a.atC);
      const [ca, cb] = [hex(a.color), hex(b.color)];
      return toHex(ca.map((v, k) => v + (cb[k] - v) * t));
    }
  }
  return stops[stops.length - 1].color;
}
