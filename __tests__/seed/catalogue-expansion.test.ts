/**
 * The seed's expansion tables against published curves: reach to each alloy's limit, density
 * (linear strain interpolation within 1 % of the source's own curve), agreement within 2 % where a
 * second published source gives the same point, and exact transcription where a table is cited.
 */
import { CAUTION_MARGIN_C } from '../../shared/engine/limits';
import { B31_3, b31Strain, CALLISTER_CP_TI_CTE, EN_10095_CTE, enAnnexC, enCarbon, enMeanOnBasis, fToC, PER_F_TO_PER_K, TE1_2001_GROUP1_B } from './oracles';
import { type Alloy, byUns, catalogue, clone, knots, relErr, strainAt, strainFrom, topOf } from './seed-catalogue';

const GRADES_18_8 = ['S30400', 'S30409', 'S31603', 'S31635', 'S32100', 'S32109', 'S34700'];
/** Only three points are published for titanium here (100/315/540 and 100/315/650 °C); both alloys say so. */
const SPARSE_KNOWN = ['R50400', 'R56400'];
const C_TO_F = (c: number) => c * 1.8 + 32;
/** ASME II-D (2001) TE-1 Group 1 column B, every 50 °F from 100 to 1300 °F (reference-data §1.3 and the same reproduction). */
const TE1_2001_GROUP1_B_ALL: [number, number][] = [[100, 6.5], [150, 6.6], [200, 6.7], [250, 6.8], [300, 6.9], [350, 7.0], [400, 7.1], [450, 7.2], [500, 7.3], [550, 7.3], [600, 7.4], [650, 7.5], [700, 7.6], [750, 7.7], [800, 7.8], [850, 7.9], [900, 7.9], [950, 8.0], [1000, 8.1], [1050, 8.1], [1100, 8.2], [1150, 8.3], [1200, 8.3], [1250, 8.4], [1300, 8.4]];


const SHEETS: Record<string, Record<number, number>> = {
  // Stockholder data page 1.4016 (430), from 20 °C: the EN 10088-1 series the seed had recalled for the ferritic grades.
  'ds-14016-stockholder': { 100: 10.0, 200: 10.0, 300: 10.5, 400: 10.5, 500: 11.0 },
  // Stockholder data page 1.4512 (409), from 20 °C.
  'ds-14512-stockholder': { 100: 10.5, 200: 11.0, 300: 11.5, 400: 12.0, 500: 12.0 },
  // Producer data sheet Alloy 718, from 25 °C.
  'ds-718': { 93: 12.8, 204: 13.5, 316: 13.9, 427: 14.2, 538: 14.4, 649: 15.1, 760: 16.0 },
  // Producer data sheet Alloy X, from 26 °C.
  'ds-alloy-x': { 93: 13.9, 538: 15.1, 649: 15.5, 732: 15.8, 816: 16.0, 899: 16.4, 982: 16.6 },
  // Supplier page Alloy 601, from 70 °F, 1e-6/°F × 1.8.
  'ds-601': Object.fromEntries([[1000, 8.5], [1200, 8.9], [1400, 9.2], [1600, 9.5], [1800, 9.8], [2000, 10.2]].map(([f, v]) => [fToC(f), v * PER_F_TO_PER_K])),
  // Supplier page CP titanium (from 0 °C) and producer page Ti-6Al-4V (from 20 °C).
  'ds-cp-ti': { 100: 8.6, 315: 9.2, 540: 9.7 },
  'ds-ti64-producer': { 100: 8.6, 315: 9.2, 650: 9.7 },
  // From memory, to be verified: EN 10088-1 ferritic series; Alloy 600 metric series (converted to 21.1 °C); Alloy X gap.
  'memory-en10088-1-ferritic': { 100: 10.0, 200: 10.0, 300: 10.5, 400: 10.5, 500: 11.0 },
  'memory-600-cte': { 500: 14.904, 600: 15.304, 700: 15.804, 800: 16.104, 900: 16.404, 1000: 16.704 },
  'memory-alloy-x-cte': { 204: 14.2, 316: 14.6, 427: 14.9 },
};
const COLUMNS: Record<string, [number, number][]> = { 'b31-3-c1-hr': B31_3.aus25_20, 'b31-3-c1-n800': B31_3.alloy800, 'b31-3-c1-ni': B31_3.alloy600_625 };
/** EN 10095 tables (mean from 20 °C at 200 °C steps), by source key and alloy; the seed moves them to the alloy's own basis. */
const EN_10095: Record<string, Record<string, Record<number, number>>> = {
  'en-10095-14876': { N08810: EN_10095_CTE['1.4876'] },
  // From memory, to be verified: the same table's rows for 1.4833 (309S) and 1.4845 (310S); no public copy was found.
  'memory-en10095-hr': {
    S30908: { 200: 16.0, 400: 17.5, 600: 18.0, 800: 18.5, 1000: 19.5 },
    S31008: { 200: 15.5, 400: 17.0, 600: 17.5, 800: 18.0, 1000: 19.0 },
  },
};
/** Sources whose own points are 200 °C apart: a knot on one of them may sit up to one such step above the knot below. */
const OWN_200_STEP = Object.keys(EN_10095);

/** The value a point must have, from the table or formula its source key names; undefined when nothing here holds it. */
function expectedCte(a: Alloy, p: { tempC: number; source: string }): number | undefined {
  if (p.source === 'en-1993-1-2-c31') return (enAnnexC(p.tempC) / (p.tempC - 20)) * 1e6;
  if (p.source === 'asme-iid-te1-g1') {
    const row = TE1_2001_GROUP1_B_ALL.find(([f]) => fToC(f) === p.tempC);
    return row ? Math.round(row[1] * PER_F_TO_PER_K * 1000) / 1000 : undefined;
  }
  const en = EN_10095[p.source]?.[a.uns];
  if (en) return en[p.tempC] === undefined ? undefined : enMeanOnBasis(en, p.tempC, a.referenceTempC);
  const col = COLUMNS[p.source]?.find(([f]) => fToC(f) === p.tempC);
  if (col) return (b31Strain(col[1]) / (col[0] - 70)) * PER_F_TO_PER_K * 1e6;
  return SHEETS[p.source]?.[p.tempC];
}

function cteProblems(a: Alloy): string[] {
  return a.cte.flatMap((p) => {
    const want = expectedCte(a, p);
    return want !== undefined && relErr(p.meanUmPerMK, want) > 1e-3 ? [`${a.uns}@${p.tempC}: ${p.meanUmPerMK} vs ${want}`] : [];
  });
}

/** Worst relative gap between the table's linear strain and a formula, every 1 °C from 50 °C to the table top. */
function formulaGap(a: Alloy, formula: (t: number) => number): { worst: number; at: number } {
  let worst = 0;
  let at = 0;
  for (let t = 50; t <= topOf(a); t += 1) {
    const exact = formula(t) - formula(a.referenceTempC);
    const gap = relErr(strainAt(a, t), exact);
    if (gap > worst) { worst = gap; at = t; }
  }
  return { worst, at };
}

/**
 * For a table with nothing finer to compare with: at tenths of each interval, linear strain against
 * the quadratic through the interval and its next knot, the smooth curve the points imply. Gaps under
 * 0.02 mm/m (the printing resolution of a coefficient given to 0.1 µm/m·K over 200 K) do not count.
 */
function curvatureGap(a: Alloy): number {
  const k = knots(a);
  let worst = 0;
  for (let i = 0; i + 1 < k.length; i++) {
    const j = i + 2 < k.length ? i + 2 : i - 1;
    if (j < 0) continue;
    const pts = [k[i], k[i + 1], k[j]];
    const quad = (t: number) => pts.reduce((s, p, m) => s + p.e * pts.reduce((q, r, n) => (n === m ? q : (q * (t - r.t)) / (p.t - r.t)), 1), 0);
    for (let f = 0.1; f < 0.95; f += 0.1) {
      const t = k[i].t + f * (k[i + 1].t - k[i].t);
      const lin = k[i].e + f * (k[i + 1].e - k[i].e);
      if (Math.abs(lin - quad(t)) > 2e-5) worst = Math.max(worst, relErr(lin, quad(t)));
    }
  }
  return worst;
}

/** Knot spacing, each interval named by the source of its upper point. */
const gaps = (a: Alloy) => knots(a).slice(1).map((p, i) => ({ gap: p.t - knots(a)[i].t, source: a.cte[i].source }));
/** Widest interval, leaving out those that end on a point of a 200 °C-step source (checked on their own). */
const maxGap = (a: Alloy) => Math.max(...gaps(a).filter((g) => !OWN_200_STEP.includes(g.source)).map((g) => g.gap));

describe('seed catalogue: expansion tables reach each alloy\'s limits', () => {
  it('when each table is read, then it rises, stays plausible for the family and reaches the highest limit plus the caution band', () => {
    const range: Record<string, [number, number]> = {
      austenitic_stainless: [15.5, 20], ferritic_stainless: [9.5, 12.5], nickel_chromium: [12.5, 18.5],
      // nickel-iron-chromium to 19: EN 10095 gives 18.5 for 1.4876 (the Alloy 800 composition) from 20 to 1000 °C.
      nickel_iron_chromium: [14, 19], titanium: [8, 10], carbon_steel: [11.5, 15.5],
    };
    const short: string[] = [];
    for (const a of catalogue.alloys) {
      const [lo, hi] = range[a.family];
      a.cte.forEach((p) => { expect(p.meanUmPerMK).toBeGreaterThanOrEqual(lo); expect(p.meanUmPerMK).toBeLessThanOrEqual(hi); });
      const e = knots(a).map((p) => p.e);
      e.forEach((v, i) => i > 0 && expect(v).toBeGreaterThan(e[i - 1]));
      if (topOf(a) < Math.max(a.maxContinuousC, a.maxIntermittentC) + CAUTION_MARGIN_C) short.push(a.uns);
    }
    expect(short).toEqual([]);
  });

  it('when every expansion point is looked up, then each is held by an exact check against its cited table or formula', () => {
    const unchecked = catalogue.alloys.flatMap((a) => a.cte.filter((p) => expectedCte(a, p) === undefined).map((p) => `${a.uns}@${p.tempC} (${p.source})`));
    expect(unchecked).toEqual([]);
    expect(catalogue.alloys.flatMap(cteProblems)).toEqual([]);
  });

  it('when any one point of any alloy is 3 % off, then the checks report it', () => {
    for (const a of catalogue.alloys) {
      const bad = clone(a);
      bad.cte[Math.floor(bad.cte.length / 2)].meanUmPerMK *= 1.03;
      expect(cteProblems(bad)).toHaveLength(1);
    }
  });
});

describe('seed catalogue: tables are dense enough for linear strain interpolation', () => {
  it('when 18Cr-8Ni grades cite EN 1993-1-2 Annex C, then each point reproduces the closed form and interpolation stays within 1 % of it', () => {
    for (const uns of GRADES_18_8) {
      const a = byUns(uns);
      expect(a.cte.every((p) => p.source === 'en-1993-1-2-c31')).toBe(true);
      a.cte.forEach((p) => expect(relErr(p.meanUmPerMK * 1e-6 * (p.tempC - 20), enAnnexC(p.tempC))).toBeLessThan(5e-5));
      const { worst } = formulaGap(a, enAnnexC);
      expect(worst).toBeLessThan(0.01);
      expect(worst).toBeLessThan(0.004); // measured 0.34 %, at 51 °C
    }
  });

  it('when carbon steel cites ASME II-D TE-1 Group 1, then every 50 °F row of column B is there, × 1.8 on the 70 °F basis', () => {
    const a = byUns('G10200');
    expect(a.referenceTempC).toBe(21.1);
    const rows = TE1_2001_GROUP1_B_ALL;
    expect(a.cte.map((p) => [p.tempC, p.meanUmPerMK])).toEqual(rows.map(([f, b]) => [fToC(f), Math.round(b * PER_F_TO_PER_K * 1000) / 1000]));
  });

  it('when a table cites a B31.3 column, then it carries every 50 °F row of that column, converted exactly', () => {
    const cases: [string, string, [number, number][]][] = [
      ['S30908', 'b31-3-c1-hr', B31_3.aus25_20], ['S31008', 'b31-3-c1-hr', B31_3.aus25_20],
      ['N08810', 'b31-3-c1-n800', B31_3.alloy800],
      ['N06600', 'b31-3-c1-ni', B31_3.alloy600_625], ['N06625', 'b31-3-c1-ni', B31_3.alloy600_625], ['N06601', 'b31-3-c1-ni', B31_3.alloy600_625],
    ];
    for (const [uns, key, col] of cases) {
      const a = byUns(uns);
      expect(a.referenceTempC).toBe(21.1);
      const pts = a.cte.filter((p) => p.source === key);
      expect(pts.map((p) => p.tempC)).toEqual(col.map(([f]) => fToC(f)));
      col.forEach(([f, c], i) => expect(Math.abs(pts[i].meanUmPerMK - (b31Strain(c) / (f - 70)) * PER_F_TO_PER_K * 1e6)).toBeLessThan(6e-4));
    }
  });

  it('when any table is read, then its knots are at most 140 °C apart and the points imply a curve it follows within 1 %', () => {
    const problems: string[] = [];
    for (const a of catalogue.alloys) {
      if (SPARSE_KNOWN.includes(a.uns)) continue;
      if (maxGap(a) > 140) problems.push(`${a.uns}: knots ${maxGap(a).toFixed(0)} °C apart`);
      if (curvatureGap(a) > 0.01) problems.push(`${a.uns}: ${(curvatureGap(a) * 100).toFixed(2)} % from its own curve`);
    }
    expect(problems).toEqual([]);
  });

  it('when a table follows a 200 °C-step standard, then only its intervals ending on that standard\'s points are wider than 140 °C, and by at most one step', () => {
    const wide = catalogue.alloys.flatMap((a) => gaps(a).filter((g) => OWN_200_STEP.includes(g.source)).map((g) => ({ uns: a.uns, ...g })));
    expect(wide.length).toBeGreaterThan(0);
    wide.forEach((g) => expect(g.gap).toBeLessThanOrEqual(201.2)); // 398.9 → 600 °C, where the B31.3 column hands over
    // The widened check still catches a table that skips one of the standard's points.
    const a = clone(byUns('N08810'));
    a.cte = a.cte.filter((p) => p.tempC !== 800);
    expect(gaps(a).some((g) => g.gap > 201.2)).toBe(true);
  });

  it('when a table hands over from a B31.3 column to EN 10095 points, then both sources are named in its cautions and the recalled ones are flagged', () => {
    for (const uns of ['N08810', 'S30908', 'S31008']) {
      const a = byUns(uns);
      const keys = [...new Set(a.cte.map((p) => p.source))];
      expect(keys).toHaveLength(2);
      expect(keys[0]).toMatch(/^b31-3-c1-/);
      expect(a.cte.filter((p) => !p.source.startsWith('b31-3-c1-')).map((p) => p.tempC)).toEqual([600, 800, 1000]);
      expect(a.dataCautions).toMatch(/B31\.3/);
      expect(a.dataCautions).toMatch(/EN 10095/);
    }
    for (const uns of ['S30908', 'S31008']) expect(byUns(uns).dataCautions).toMatch(/recalled from memory[^.]*to be verified/);
  });

  it('when the sparse titanium tables are read, then their cautions say so', () => {
    for (const uns of SPARSE_KNOWN) expect(byUns(uns).dataCautions).toMatch(/three published points/);
  });

  it('when the old three-point 321 table is tried, then the density checks reject it (the issue\'s +6 % at 200 °C)', () => {
    const a = clone(byUns('S32100'));
    a.cte = [[100, 16.6], [600, 18.9], [1000, 20.5]].map(([t, v]) => ({ tempC: t, meanUmPerMK: v, source: 'x' }));
    expect(maxGap(a)).toBeGreaterThan(140);
    expect(formulaGap(a, enAnnexC).worst).toBeGreaterThan(0.05);
    const at200 = relErr(strainAt(a, 200), enAnnexC(200));
    expect(at200).toBeGreaterThan(0.055); // reference: EN Annex C at 200 °C, 3.0435 mm/m
  });
});

describe('seed catalogue: a second published source agrees within 2 %', () => {
  it('when the 18Cr-8Ni grades are compared with the B31.3 18Cr-8Ni column (which covers 304, 321 and 347), then every row from 250 °F agrees within 2 %', () => {
    // Tolerance: 2 % plus the column's printing resolution (±0.005 in/100 ft). Below 250 °F the rise is under
    // 100 K; there EN Annex C runs 2.3–4.3 % under the column, at most 0.03 mm/m, bounded separately.
    let worst = 0;
    for (const uns of GRADES_18_8) {
      const a = byUns(uns);
      for (const [f, c] of B31_3.aus18_8) {
        const got = strainFrom(a, fToC(70), fToC(f));
        if (f < 250) {
          expect(Math.abs(got - b31Strain(c))).toBeLessThan(0.03e-3);
          continue;
        }
        const gap = relErr(got, b31Strain(c));
        expect(gap).toBeLessThan(0.02 + 0.005 / c);
        worst = Math.max(worst, gap);
      }
    }
    expect(worst).toBeGreaterThan(0.015); // measured 2.0 % at 450 °F: the two published curves do differ this much
  });

  it('when 321 at 800 °F is compared with B31.3, then it is within 1.5 %, where the old three-point table was +3.7 %', () => {
    const gap = strainFrom(byUns('S32100'), fToC(70), fToC(800)) / b31Strain(8.8) - 1;
    expect(Math.abs(gap)).toBeLessThan(0.015);
  });

  it('when carbon steel (TE-1) is compared with EN 1993-1-2 §3.4.1.1, then rows from 400 to 900 °F and at 1200 °F agree within 2 %, and the rest differ as published', () => {
    const a = byUns('G10200');
    const gapAt = (f: number) => (enCarbon(fToC(f)) - enCarbon(fToC(70))) / strainFrom(a, fToC(70), fToC(f)) - 1;
    for (const f of [400, 500, 600, 700, 800, 900, 1200]) expect(Math.abs(gapAt(f))).toBeLessThan(0.02);
    // Named disagreements between the two published laws (EN relative to TE-1): higher near room temperature, lower at 540–590 °C.
    expect(gapAt(200)).toBeCloseTo(0.034, 2);
    expect(gapAt(300)).toBeCloseTo(0.021, 2);
    expect(gapAt(1000)).toBeCloseTo(-0.023, 2);
    expect(gapAt(1100)).toBeCloseTo(-0.020, 2);
    // The older B31.3 steel column is lower still at low temperature (e.g. 0.99 against TE-1's 1.0 in/100 ft at 200 °F, 2.70 against 2.8 at 400 °F).
    expect(strainFrom(a, fToC(70), fToC(400)) / b31Strain(2.7) - 1).toBeCloseTo(0.041, 2);
    expect(TE1_2001_GROUP1_B.length).toBeGreaterThan(5);
  });

  it('when commercially pure titanium is compared with the textbook value (Callister Table B.6, 8.6e-6/K), then it agrees within 2 %', () => {
    expect(relErr(byUns('R50400').cte[0].meanUmPerMK, CALLISTER_CP_TI_CTE)).toBeLessThan(0.02);
  });

  it('when Alloy 625 is compared with the B31.3 600/625 column, then it is on it, where the old table ran 5–6 % below', () => {
    const a = byUns('N06625');
    for (const [f, c] of B31_3.alloy600_625) expect(relErr(strainFrom(a, 21.1, fToC(f)), b31Strain(c))).toBeLessThan(0.002);
  });

  it('when Alloy 800H below 400 °C is compared, then EN 10095 (1.4876) runs 3–5 % under the B31.3 Alloy 800/825 column, which is why the table keeps the column there', () => {
    // Both published, both mean coefficients: EN from 20 °C, B31.3 from 70 °F (21.1 °C); 1.1 °C of basis changes either by under 0.1 %.
    const col = (f: number) => (b31Strain(B31_3.alloy800.find(([x]) => x === f)![1]) / (f - 70)) * PER_F_TO_PER_K * 1e6;
    const colAt200C = col(350) + ((col(400) - col(350)) * (200 - fToC(350))) / (fToC(400) - fToC(350)); // 392 °F, between the 350 and 400 °F rows
    const en = EN_10095_CTE['1.4876'];
    expect(en[200] / colAt200C - 1).toBeCloseTo(-0.048, 2);
    expect(en[400] / col(750) - 1).toBeCloseTo(-0.029, 2); // 400 °C against the 750 °F (398.9 °C) row
    // The seed carries the column, not the lower EN values, up to 398.9 °C.
    const a = byUns('N08810');
    expect(a.cte.filter((p) => p.tempC < 400).every((p) => p.source === 'b31-3-c1-n800')).toBe(true);
    expect(a.cte.filter((p) => p.tempC > 400).map((p) => p.tempC)).toEqual([600, 800, 1000]);
  });

  it('when 310S is compared with 304 at 800 °F, then it expands about 11 % less (its own B31.3 column, not the 18/8 curve)', () => {
    const ratio = strainFrom(byUns('S31008'), 21.1, fToC(800)) / strainFrom(byUns('S30400'), fToC(70), fToC(800));
    expect(ratio).toBeGreaterThan(0.87);
    expect(ratio).toBeLessThan(0.91); // B31.3: 7.85 / 8.80 = 0.892
  });
});

describe('seed catalogue: data-sheet tables are transcribed exactly', () => {
  const same = (uns: string, key: string, rows: [number, number][]) => {
    const pts = byUns(uns).cte.filter((p) => p.source === key).map((p) => [p.tempC, p.meanUmPerMK]);
    expect(pts).toEqual(rows);
  };

  it('when 409, 718, Alloy X and 601 cite their sheets, then the seed equals the sheet on the sheet\'s own basis', () => {
    same('S40910', 'ds-14512-stockholder', [[100, 10.5], [200, 11.0], [300, 11.5], [400, 12.0], [500, 12.0]]);
    same('N07718', 'ds-718', [[93, 12.8], [204, 13.5], [316, 13.9], [427, 14.2], [538, 14.4], [649, 15.1], [760, 16.0]]);
    same('N06002', 'ds-alloy-x', [[93, 13.9], [538, 15.1], [649, 15.5], [732, 15.8], [816, 16.0], [899, 16.4], [982, 16.6]]);
    const per601: [number, number][] = [[1000, 8.5], [1200, 8.9], [1400, 9.2], [1600, 9.5], [1800, 9.8], [2000, 10.2]];
    const pts = byUns('N06601').cte.filter((p) => p.source === 'ds-601');
    expect(pts.map((p) => p.tempC)).toEqual(per601.map(([f]) => fToC(f)));
    per601.forEach(([, v], i) => expect(pts[i].meanUmPerMK).toBeCloseTo(v * PER_F_TO_PER_K, 9));
    expect(C_TO_F(fToC(2000))).toBeCloseTo(1999.94, 1);
  });
});
