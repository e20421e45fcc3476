/** The seed catalogue's structure and provenance: sources, names, prices, limits, notes and cautions. */
import { toBeVerified } from '../../shared/catalogue/to-be-verified';
import { alloyInputSchema, sourceInputSchema } from '../../shared/schemas/alloy';
import { byUns, catalogue, catalogueText, sourceByKey, topOf } from './seed-catalogue';

const REQUIRED: Record<string, string> = {
  S30400: 'austenitic_stainless', S30409: 'austenitic_stainless', S31603: 'austenitic_stainless', S31635: 'austenitic_stainless',
  S32100: 'austenitic_stainless', S32109: 'austenitic_stainless', S34700: 'austenitic_stainless',
  S30908: 'austenitic_stainless', S31008: 'austenitic_stainless',
  S40910: 'ferritic_stainless', S43000: 'ferritic_stainless', S43035: 'ferritic_stainless', S43940: 'ferritic_stainless',
  N06600: 'nickel_chromium', N06601: 'nickel_chromium', N06625: 'nickel_chromium', N07718: 'nickel_chromium', N06002: 'nickel_chromium',
  N08810: 'nickel_iron_chromium', R50400: 'titanium', R56400: 'titanium',
};
const FAMILIES = ['austenitic_stainless', 'ferritic_stainless', 'nickel_chromium', 'nickel_iron_chromium', 'titanium', 'carbon_steel'];
const KINDS = ['standard', 'handbook', 'datasheet', 'memory'];
/** Generic designations only: a type number (with H, L, S or Ti), "Alloy" with a generic number or letter, a titanium grade, a carbon-steel grade. */
const GENERIC_DESIGNATION = /^(Type \d{3}([A-Z]|Ti)?(\/\d{3}[A-Z])?|Alloy (\d{3}[A-Z]{0,2}|[A-Z])|Titanium Grade \d{1,2}|Ti-\d+Al-\d+V|Carbon steel \d{4})$/;
const isMemory = (key: string) => sourceByKey.get(key)?.kind === 'memory';

describe('seed catalogue: structure and provenance', () => {
  it('when the sources are listed, then keys are unique, kinds are valid and memory sources say they are to be verified', () => {
    const keys = catalogue.sources.map((s) => s.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const s of catalogue.sources) {
      expect(KINDS).toContain(s.kind);
      if (s.kind === 'memory') expect(s.title.startsWith('From memory — to be verified')).toBe(true);
    }
  });

  it('when each source and alloy is parsed with the shared schemas, then all pass as the seeder will read them', () => {
    const bad = [
      ...catalogue.sources.filter((s) => !sourceInputSchema.safeParse(s).success).map((s) => s.key),
      ...catalogue.alloys
        .filter((a) => {
          const cite = <P extends { source: string }>(pts: P[]) => pts.map(({ source, ...p }) => ({ ...p, sourceId: source }));
          return !alloyInputSchema.safeParse({ ...a, densitySourceId: a.densitySource, limitsSourceId: a.limitsSource, cte: cite(a.cte), modulus: cite(a.modulus), yield: cite(a.yield) }).success;
        })
        .map((a) => a.uns),
    ];
    expect(bad).toEqual([]);
  });

  it('when any number is given, then it cites a source key that exists, and every source is cited', () => {
    const cited = new Set<string>();
    for (const a of catalogue.alloys) {
      [a.densitySource, a.limitsSource, ...[...a.cte, ...a.modulus, ...a.yield].map((p) => p.source)].forEach((k) => cited.add(k));
    }
    expect([...cited].filter((k) => !sourceByKey.has(k))).toEqual([]);
    expect(catalogue.sources.map((s) => s.key).filter((k) => !cited.has(k))).toEqual([]);
  });

  it('when the fire-design and typical-value sources the issue retired are looked for, then none is left', () => {
    // EN 1993-1-2 Table 3.1 k_y and Table C.1 k_E/k_0.2p, typical short-time yields, a three-point 321/347 sheet.
    for (const key of ['en-1993-1-2-t31-ky', 'en-1993-1-2-tc1-14301', 'en-1993-1-2-tc1-14401', 'ds-hightemp-stainless', 'ds-321-347-cte']) {
      expect(sourceByKey.has(key)).toBe(false);
    }
  });

  it('when UNS numbers and designations are read, then each is unique, generic and without ®/™', () => {
    const uns = catalogue.alloys.map((a) => a.uns);
    uns.forEach((u) => expect(u).toMatch(/^[A-Z]\d{5}$/));
    expect(new Set(uns).size).toBe(uns.length);
    expect(catalogue.alloys.map((a) => a.designation).filter((d) => !GENERIC_DESIGNATION.test(d))).toEqual([]);
    expect(catalogueText).not.toMatch(/[®™]/);
  });

  it('when the required grades are looked up, then all are present with the right family, plus a carbon-steel baseline', () => {
    catalogue.alloys.forEach((a) => expect(FAMILIES).toContain(a.family));
    for (const [uns, family] of Object.entries(REQUIRED)) expect(byUns(uns).family).toBe(family);
    const carbon = catalogue.alloys.filter((a) => a.family === 'carbon_steel');
    expect(carbon.map((a) => a.uns)).toEqual(['G10200']);
  });

  it('when prices are read, then they are EUR demo values with an ISO date, in the order of the trade', () => {
    for (const a of catalogue.alloys) {
      expect(a.priceIsDemo).toBe(true);
      expect(a.currency).toBe('EUR');
      expect(a.priceSetOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    }
    const p = (uns: string) => byUns(uns).pricePerKg;
    // Common practice, no published source: small-lot tube is priced per kg roughly carbon < ferritic < 304 < 316L < 321 < nickel alloys,
    // with 321 at about 2–3 × 304 (the figure from the trade).
    expect(p('S32100') / p('S30400')).toBeGreaterThanOrEqual(2);
    expect(p('S32100') / p('S30400')).toBeLessThanOrEqual(3);
    expect(p('G10200')).toBeLessThan(p('S40910'));
    expect(p('S40910')).toBeLessThan(p('S30400'));
    expect(p('S30400')).toBeLessThan(p('S31603'));
    expect(p('S31603')).toBeLessThan(p('S32100'));
    for (const ni of ['N06600', 'N06601', 'N06625', 'N07718', 'N06002', 'N08810']) expect(p(ni)).toBeGreaterThan(p('S34700'));
    // Small-lot tube, not mill coil: 304 at 10 €/kg or more (common practice, no published source).
    expect(p('S30400')).toBeGreaterThanOrEqual(10);
  });

  it('when density and service limits are read, then they are physical numbers', () => {
    for (const a of catalogue.alloys) {
      expect(a.densityKgM3).toBeGreaterThan(4000);
      expect(a.densityKgM3).toBeLessThan(9500);
      [a.maxContinuousC, a.maxIntermittentC].forEach((t) => { expect(t).toBeGreaterThan(300); expect(t).toBeLessThanOrEqual(1250); });
    }
  });

  it('when notes are read, then stabilised grades say so and every alloy mentions welding or filler', () => {
    for (const uns of ['S32100', 'S32109', 'S34700', 'S31635', 'S40910', 'S43035', 'S43940']) expect(byUns(uns).notes).toMatch(/stabilised/i);
    for (const uns of ['S30400', 'S30409', 'S31603', 'S30908', 'S31008', 'S43000']) expect(byUns(uns).notes).toMatch(/not stabilised/i);
    expect(byUns('S32100').notes).toMatch(/347[^.]*filler/);
    catalogue.alloys.forEach((a) => expect(a.notes).toMatch(/weld|filler|TIG|MIG/i));
  });

  it('when warning ranges are read, then each is ordered and the expected metallurgical warnings are present', () => {
    for (const a of catalogue.alloys) for (const w of a.warningRanges) expect(w.fromC).toBeLessThan(w.toC);
    const codes = (uns: string) => byUns(uns).warningRanges.map((w) => w.code);
    ['S30400', 'S30409', 'S31603', 'S30908', 'S31008'].forEach((u) => expect(codes(u)).toContain('carbide_precipitation'));
    ['S32100', 'S32109', 'S34700', 'S31635'].forEach((u) => expect(codes(u)).not.toContain('carbide_precipitation'));
    ['S40910', 'S43000', 'S43035', 'S43940'].forEach((u) => expect(codes(u)).toContain('embrittlement_475'));
    expect(codes('N07718')).toContain('over_ageing');
    // SSINA: carbide precipitation in the 300 series at 800–1600 °F (427–871 °C).
    expect(byUns('S30400').warningRanges.find((w) => w.code === 'carbide_precipitation')).toMatchObject({ fromC: 427, toC: 871 });
  });
});

describe('seed catalogue: what is lowered or still to be verified is said on the alloy', () => {
  it('when an alloy\'s limit was lowered to its data, then its cautions say so and the limit sits 50 °C under the table top', () => {
    const lowered = catalogue.alloys.filter((a) => /Usable limit lowered/.test(a.dataCautions));
    expect(lowered.map((a) => a.uns).sort()).toEqual(['N06002', 'N06600', 'N06601', 'N06625', 'N08810', 'S30908', 'S31008', 'S40910', 'S43000', 'S43035', 'S43940']);
    for (const a of lowered) {
      expect(a.maxContinuousC).toBe(a.maxIntermittentC);
      expect(a.maxContinuousC).toBe(Math.floor(topOf(a) - 50));
      expect(a.dataCautions).toContain(`${a.maxContinuousC} °C`);
    }
  });

  it('when a value cites a source from memory, then the alloy lists it as to be verified (what the screen and CSV show)', () => {
    const cited = (uns: string) => {
      const a = byUns(uns);
      const cite = <P extends { source: string }>(pts: P[]) => pts.map((p) => ({ ...p, sourceId: p.source }));
      return { densitySourceId: a.densitySource, limitsSourceId: a.limitsSource, cte: cite(a.cte), modulus: cite(a.modulus), yield: cite(a.yield) };
    };
    // 304/304L: its room-temperature minimum and the EN elevated-temperature minimums are recalled, not read.
    expect(toBeVerified(cited('S30400'), isMemory)).toEqual(['yield at 20–550 °C (11 points)']);
    // Alloy X: three recalled expansion points fill the producer sheet's gap.
    expect(toBeVerified(cited('N06002'), isMemory)).toEqual(['expansion at 204, 316, 427 °C', 'yield at 20 °C']);
    // 310S: the EN 10095 points above the B31.3 column are recalled; 800H: everything read (EN 10095 gives its limit and minimum proof strength).
    expect(toBeVerified(cited('S31008'), isMemory)).toEqual(['density', 'expansion at 600, 800, 1000 °C']);
    expect(toBeVerified(cited('N08810'), isMemory)).toEqual([]);
    // 409: everything read from the stockholder sheet except the service limits.
    expect(toBeVerified(cited('S40910'), isMemory)).toEqual(['service limits']);
  });
});
