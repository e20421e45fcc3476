/** Checks the invented demo flex sections in data/seed/flex-parts.json. */
import * as fs from 'fs';
import * as path from 'path';

interface FlexPart {
  code: string; name: string; boreMm: number; liveLengthMm: number;
  ratedAxialCompressionMm: number; ratedAxialExtensionMm: number; lateralOffsetMm: number;
  purpose: string; overallLengthMm: number; meanDiameterMm: number; ratedAngularDeg: number; ratedCycles: number | null;
  maxTempC: number; price: number; currency: string; isDemo: boolean;
}

const parts: FlexPart[] = JSON.parse(fs.readFileSync(path.join(__dirname, '..', '..', 'data', 'seed', 'flex-parts.json'), 'utf8'));
/** Common exhaust tube ODs: 2.0, 2.25, 2.5, 3.0, 3.5, 4.0 in × 25.4 mm (exact). */
const BORES_MM = [2.0, 2.25, 2.5, 3.0, 3.5, 4.0].map((inch) => Math.round(inch * 25.4 * 100) / 100);

describe('seed flex parts', () => {
  it('when the list is read, then it holds about a dozen parts with unique codes of our own pattern', () => {
    expect(parts.length).toBeGreaterThanOrEqual(10);
    const codes = parts.map((p) => p.code);
    expect(new Set(codes).size).toBe(codes.length);
    codes.forEach((c) => expect(c).toMatch(/^DL-(FX|VD)-\d{2,3}-\d{3}$/));
    // Flex sections take growth; the decouplers are there to show the warning when one is picked for it.
    parts.forEach((p) => expect(p.purpose).toBe(p.code.startsWith('DL-FX') ? 'thermal_bellows' : 'vibration_decoupler'));
  });

  it('when bores are read, then each is a common exhaust bore and every bore is covered', () => {
    expect(BORES_MM).toEqual([50.8, 57.15, 63.5, 76.2, 88.9, 101.6]);
    parts.forEach((p) => expect(BORES_MM).toContain(p.boreMm));
    BORES_MM.forEach((b) => expect(parts.some((p) => p.boreMm === b)).toBe(true));
  });

  it('when rated movements and limits are read, then they are positive and in plausible ranges', () => {
    for (const p of parts) {
      expect(p.ratedAxialCompressionMm).toBeGreaterThan(0);
      expect(p.ratedAxialExtensionMm).toBeGreaterThan(0);
      expect(p.lateralOffsetMm).toBeGreaterThan(0);
      expect(p.ratedAxialCompressionMm).toBeGreaterThanOrEqual(8);
      expect(p.ratedAxialCompressionMm).toBeLessThanOrEqual(30);
      expect(p.liveLengthMm).toBeGreaterThanOrEqual(100);
      expect(p.liveLengthMm).toBeLessThanOrEqual(300);
      expect(p.maxTempC).toBeGreaterThanOrEqual(700);
      expect(p.maxTempC).toBeLessThanOrEqual(1000);
    }
  });

  it('when sizes for the equivalent-movement check are read, then the mean diameter sits just outside the bore and the ends add to the live length', () => {
    for (const p of parts) {
      // A bellows' mean diameter is the bore plus about one convolution height: invented demo values 10–20 % over the bore.
      expect(p.meanDiameterMm / p.boreMm).toBeGreaterThan(1.1);
      expect(p.meanDiameterMm / p.boreMm).toBeLessThan(1.2);
      expect(p.overallLengthMm).toBeGreaterThan(p.liveLengthMm);
      expect(p.ratedAngularDeg).toBeGreaterThan(0);
      if (p.ratedCycles !== null) expect(Number.isInteger(p.ratedCycles)).toBe(true);
    }
  });

  it('when prices are read, then they are positive EUR demo values', () => {
    for (const p of parts) {
      expect(p.isDemo).toBe(true);
      expect(p.currency).toBe('EUR');
      expect(p.price).toBeGreaterThan(0);
    }
  });
});
