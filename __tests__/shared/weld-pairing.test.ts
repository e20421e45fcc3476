import fs from 'node:fs';
import path from 'node:path';
import type { AlloyFamily } from '../../shared/schemas/alloy';
import { FUME_CAUTIONS, fumeCautions, type WeldMetal } from '../../shared/welds/weld-metals';
import { pairWeld, type PairRule } from '../../shared/welds/weld-pairing';
import { sharedPair } from '../../shared/welds/weld-rule-match';
import { weldSites, type WeldRunInput } from '../../shared/welds/weld-sites';

type SeedRule = Omit<PairRule, 'id' | 'version' | 'procedureRef'> & { key: string };
const seedFile = JSON.parse(fs.readFileSync(path.join(__dirname, '../../data/seed/weld-rules.json'), 'utf8')) as { rules: SeedRule[] };
// The shop table as seeded: the pairing is tested against the published guidance it was seeded from.
const RULES: (PairRule & { key: string })[] = seedFile.rules.map((r) => ({ ...r, id: r.key, version: 1, procedureRef: '' }));

const metal = (uns: string, designation: string, family: AlloyFamily): WeldMetal => ({ uns, designation, family });
const T304 = metal('S30400', 'Type 304/304L', 'austenitic_stainless');
const T321 = metal('S32100', 'Type 321', 'austenitic_stainless');
const T347 = metal('S34700', 'Type 347', 'austenitic_stainless');
const T316L = metal('S31603', 'Type 316L', 'austenitic_stainless');
const T409 = metal('S40910', 'Type 409', 'ferritic_stainless');
const CS = metal('G10200', 'Carbon steel 1020', 'carbon_steel');
const A600 = metal('N06600', 'Alloy 600', 'nickel_chromium');
const A625 = metal('N06625', 'Alloy 625', 'nickel_chromium');
const A718 = metal('N07718', 'Alloy 718', 'nickel_chromium');
const TI2 = metal('R50400', 'Titanium Grade 2', 'titanium');

const filler = (a: WeldMetal, b: WeldMetal) => {
  const o = pairWeld(a, b, RULES);
  return o.status === 'rule' ? o.rule.filler : o.status;
};

describe('fillers for base-metal pairs', () => {
  it.each([
    // [a, b, filler, source]
    [T304, T304, 'ER308L', 'AWS A5.9 annex: ER308L for 304 and 304L (from memory)'],
    [T321, T321, 'ER347', 'AWS A5.9 annex: ER347 for the stabilised grades 321 and 347 (from memory)'],
    [T347, T321, 'ER347', 'AWS A5.9 annex: ER347 for 347 and 321 (from memory)'],
    [T316L, T316L, 'ER316L', 'AWS A5.9 annex: ER316L for 316L (from memory)'],
    [T321, CS, 'ER309L', 'AWS A5.9 annex: ER309L for stainless to carbon steel (from memory)'],
    [CS, T304, 'ER309L', 'AWS A5.9 annex: ER309L for stainless to carbon steel, either way round (from memory)'],
    [T409, CS, 'ER309L', 'AWS A5.9 annex: ER309L for ferritic stainless to carbon steel (from memory)'],
    [A600, A600, 'ERNiCr-3', 'AWS A5.14 annex and Special Metals, Joining: ERNiCr-3 for Alloy 600 (from memory)'],
    [A625, A625, 'ERNiCrMo-3', 'AWS A5.14 annex and Special Metals, Joining: ERNiCrMo-3 for Alloy 625 (from memory)'],
    [A600, T304, 'ERNiCr-3', 'AWS A5.14 annex: ERNiCr-3 for nickel alloy to stainless (from memory)'],
    [T321, A625, 'ERNiCrMo-3', 'Special Metals, Joining: ERNiCrMo-3 for Alloy 625 to stainless (from memory)'],
    [TI2, TI2, 'ERTi-2', 'AWS A5.16: ERTi-2 matches Grade 2 titanium (from memory)'],
  ])('when %s is welded to %s, then the filler is %s (%s)', (a, b, expected) => {
    expect(filler(a, b)).toBe(expected);
  });

  it('when titanium meets steel or stainless, then the weld is refused with the reason, whatever the table holds', () => {
    const anything: PairRule = { ...RULES[0], id: 'x', sideA: ['R50400'], sideB: ['G10200', 'S30400'] };
    for (const other of [CS, T304]) {
      const o = pairWeld(TI2, other, [anything, ...RULES]);
      expect(o.status).toBe('refused');
      expect(o.message).toMatch(/never fusion-welded/);
      expect(o.message).toMatch(/brittle intermetallic/);
    }
  });

  it('when the table has no rule for a pair, then it says so and names no filler', () => {
    const o = pairWeld(A718, A625, RULES);
    expect(o.status).toBe('no_rule');
    expect(o.rule).toBeNull();
    expect(o.message).toMatch(/^No rule for this pair \(Alloy 718 \(N07718\) to Alloy 625 \(N06625\)\)/);
  });

  it('when the table is seeded, then no pair has two rules and every rule names its source', () => {
    for (const [i, x] of RULES.entries()) {
      expect(x.source.length).toBeGreaterThan(10);
      for (const y of RULES.slice(i + 1)) expect([x.key, y.key, sharedPair(x, y)]).toEqual([x.key, y.key, null]);
    }
  });
});

describe('purge and fume notes', () => {
  it('when stainless or nickel alloy is welded, then the rule asks for an argon root purge; titanium asks for trailing and root shielding', () => {
    const purge = (a: WeldMetal, b: WeldMetal) => (pairWeld(a, b, RULES) as { rule: PairRule }).rule.purge;
    expect(purge(T321, T321)).toMatch(/Argon back-purge on the root side/);
    expect(purge(A625, A625)).toMatch(/Argon back-purge on the root side/);
    expect(purge(TI2, TI2)).toMatch(/trailing shield/);
    expect(purge(TI2, TI2)).toMatch(/root shielding/);
  });

  it('when chromium or nickel is in the joint, then the hexavalent chromium and nickel fume cautions are given; plain steel gets the general one', () => {
    expect(fumeCautions(T321, CS, 'ER309L')).toEqual([FUME_CAUTIONS.chromium, FUME_CAUTIONS.nickel]);
    expect(fumeCautions(T409, T409, 'ER409Nb')).toEqual([FUME_CAUTIONS.chromium]);
    expect(fumeCautions(CS, CS, 'ER70S-6')).toEqual([FUME_CAUTIONS.general]);
    expect(fumeCautions(CS, CS, 'ERNiCr-3')).toEqual([FUME_CAUTIONS.chromium, FUME_CAUTIONS.nickel]);
  });
});

describe('where a run is welded', () => {
  const base = (over: Partial<WeldRunInput>): WeldRunInput => ({
    id: 'r',
    name: 'Run',
    alloyId: 'a321',
    tube: { odMm: 63.5, wallMm: 1.651 },
    lengthMm: 320,
    startFixing: 'sliding_bracket',
    endFixing: 'sliding_bracket',
    startFlangeAlloyId: null,
    endFlangeAlloyId: null,
    joint: { type: 'none' },
    ...over,
  });

  it('when a downpipe runs from a carbon-steel turbo flange to a flex part at its end, then it has the flange weld and both cuffs, the second to the next run', () => {
    const down = base({ id: 'd', startFixing: 'turbo_outlet', endFixing: 'flex_section', startFlangeAlloyId: 'cs', joint: { type: 'flex', atMm: 320 }, flexCuffUns: 'S32100' });
    const next = base({ id: 'n', alloyId: 'a304', startFixing: 'flex_section', endFixing: 'flange' });
    const sites = weldSites([down, next]);
    expect(sites.map((s) => [s.runId, s.kind, s.metals])).toEqual([
      ['d', 'tube_to_flange', [{ alloyId: 'a321' }, { alloyId: 'cs' }]],
      ['d', 'tube_to_flex', [{ alloyId: 'a321' }, { uns: 'S32100' }]],
      ['d', 'tube_to_flex', [{ uns: 'S32100' }, { alloyId: 'a304' }]],
      ['n', 'tube_to_flange', [{ alloyId: 'a304' }, { alloyId: 'a304' }]],
    ]);
  });

  it('when the tube carries on through a support, then a butt weld is listed only where the alloy or the size changes', () => {
    const a = base({ id: 'a' });
    expect(weldSites([a, base({ id: 'b' })])).toEqual([]);
    expect(weldSites([a, base({ id: 'c', alloyId: 'a304' })]).map((s) => [s.kind, s.metals])).toEqual([['tube_to_tube', [{ alloyId: 'a321' }, { alloyId: 'a304' }]]]);
    expect(weldSites([a, base({ id: 'e', tube: { odMm: 76.2, wallMm: 1.651 } })])[0].where).toMatch(/size change/);
  });

  it('when a flex part states no cuff alloy, or none is fitted, then the cuff metal is not guessed', () => {
    const stated = weldSites([base({ joint: { type: 'flex' }, flexCuffUns: null })]);
    expect(stated[0].metals[1]).toEqual({ missing: expect.stringMatching(/does not state its cuff alloy/) });
    const none = weldSites([base({ joint: { type: 'flex' } })]);
    expect(none[0].metals[1]).toEqual({ missing: expect.stringMatching(/No flex part is fitted/) });
  });
});
