import fc from 'fast-check';
import { calculateRun } from '../../shared/engine/calculate-run';
import { DEFAULT_DESIGN_BASIS, TRAVEL_SHARE_NOTE } from '../../shared/engine/design-basis';
import { assessFlexPart, type FlexDuty, FLEX_BORE_FIT_TOLERANCE_MM, sizeFlex } from '../../shared/engine/flex';
import type { FlexPart, FlexState } from '../../shared/engine/types';
import { enStainlessElongation, enStainlessElongationIntegral, stainless304 } from './published';
import { wordPhrase } from '../../shared/units';

// Fixture parts to exercise the rules: catalogue-like, not data.
const part = (over: Partial<FlexPart> = {}): FlexPart => ({
  id: 'p',
  name: 'part',
  purpose: 'thermal_bellows',
  boreMm: 76.2,
  liveLengthMm: 150,
  meanDiameterMm: 86,
  ratedAxialCompressionMm: 18,
  ratedAxialExtensionMm: 6,
  lateralOffsetMm: 4,
  ratedAngularDeg: 3,
  ratedCycles: 20_000,
  maxTempC: 900,
  price: 100,
  ...over,
});

const duty = (hot: number, cold: number, over: Partial<FlexDuty> = {}, lateral = 0, rotation = 0): FlexDuty => ({
  states: [
    { state: 'install', tempC: 20, axialGrowthMm: 0, lateralMm: 0, rotationDeg: 0 },
    { state: 'hot', tempC: 850, axialGrowthMm: hot, lateralMm: lateral, rotationDeg: rotation },
    { state: 'cold', tempC: -20, axialGrowthMm: cold, lateralMm: 0, rotationDeg: 0 },
  ] satisfies FlexState[],
  odMm: 76.2,
  tempAtFlexC: 850,
  heatCycles: null,
  travelShare: 0.7,
  ...over,
});

describe('the issue’s run: 900 mm austenitic stainless, 850 → 650 °C, part rated 18 mm compression / 6 mm extension', () => {
  const alloy = stainless304();
  const segments = [{ lengthMm: 900, startTempC: 850, endTempC: 650 }];
  const r = calculateRun({ tube: { odMm: 76.2, wallMm: 1.651 }, installTempC: 20, segments, flex: { parts: [part()] } }, alloy);
  // Growth along a linear gradient from the EN 1993-1-2 Annex C law, integrated in closed form.
  const hot = (900 * (enStainlessElongationIntegral(850) - enStainlessElongationIntegral(650))) / 200;
  // Below the fixture's first point (30 °C) its first mean coefficient holds: ε(−20 °C) = ᾱ(30)·(−40 K).
  const cold = 900 * (enStainlessElongation(30) / 10) * -40;

  it('when sized, then the hot and coldest-start movements are the published growth and contraction', () => {
    expect(r.flex?.states.find((s) => s.state === 'hot')?.axialGrowthMm).toBeCloseTo(hot, 3);
    expect(r.flex?.states.find((s) => s.state === 'cold')?.axialGrowthMm).toBeCloseTo(cold, 3);
    expect(r.flex?.axialRangeMm).toBeCloseTo(hot - cold, 3);
  });

  it('when sized, then there is one pre-set, within 70 % of the 6 mm extension rating, not the whole growth', () => {
    const preset = r.flex?.chosen?.presetMm as number;
    expect(hot).toBeGreaterThan(12);
    expect(preset).toBeLessThanOrEqual(0.7 * 6);
    // Governed by the coldest start: stretched P − G_cold must stay within 0.7 × 6 mm, to 0.1 mm.
    expect(preset).toBeCloseTo(Math.floor((0.7 * 6 + cold) * 10) / 10, 10);
    expect(r.flex).not.toHaveProperty('presetMm');
  });

  it('when sized, then no state uses more than the share of either rating', () => {
    for (const u of r.flex?.chosen?.uses ?? []) {
      expect(u.compressionUse).toBeLessThanOrEqual(0.7 + 1e-9);
      expect(u.extensionUse).toBeLessThanOrEqual(0.7 + 1e-9);
    }
    expect(r.flex?.travelShare).toBe(DEFAULT_DESIGN_BASIS.travelShare);
    expect(TRAVEL_SHARE_NOTE).toMatch(/common practice, no published source/);
  });
});

describe('flex duty in every direction', () => {
  it('when the lateral offset is more than the share of the part’s lateral rating, then it does not fit', () => {
    const a = assessFlexPart(part(), duty(5, -0.5, {}, 3));
    expect(a.lateralUse).toBeCloseTo(3 / 4, 12);
    expect(a.fits).toBe(false);
    expect(a.reasons.map((r) => wordPhrase(r, 'metric')).join(' ')).toMatch(/Lateral offset 3\.0 mm is 75 % of its 4\.0 mm rating/);
    expect(a.reasons.map((r) => wordPhrase(r, 'imperial')).join(' ')).toMatch(/Lateral offset 0\.12 in is 75 % of its 0\.16 in rating/);
  });

  it('when lateral offset is added, then the compression demand grows by the EJMA lateral term', () => {
    const plain = assessFlexPart(part(), duty(8, -0.5));
    const offset = assessFlexPart(part(), duty(8, -0.5, {}, 1));
    const hotPlain = plain.uses.find((u) => u.state === 'hot')!;
    const hotOffset = offset.uses.find((u) => u.state === 'hot')!;
    expect(hotPlain.positionMm).toBeCloseTo(hotOffset.positionMm, 12);
    // 3·D_m·y/(L_b + p): fixed–guided beam strain summed over the live length (see ejma.test.ts).
    expect(hotOffset.equivalentMm).toBeCloseTo((3 * 86 * 1) / (150 + hotOffset.positionMm), 12);
    expect(hotOffset.compressionUse).toBeGreaterThan(hotPlain.compressionUse);
  });

  it('when rotation exceeds the share of the angular rating, then it does not fit', () => {
    expect(assessFlexPart(part(), duty(5, -0.5, {}, 0, 2)).fits).toBe(true);
    expect(assessFlexPart(part(), duty(5, -0.5, {}, 0, 2.5)).fits).toBe(false);
  });

  it('when the system starts colder than it was installed, then the extension that follows is checked', () => {
    // No extension rating, 10 mm compression: 70 % of it (7 mm) takes 6.8 mm of hot growth set
    // at its neutral length, and at most 0.2 mm pre-compressed; a start 0.6 mm shorter than
    // installed would need 0.6 mm of pre-compression, more than that.
    const noExtension = part({ ratedAxialExtensionMm: 0, ratedAxialCompressionMm: 10 });
    expect(assessFlexPart(noExtension, duty(6.8, 0)).fits).toBe(true);
    expect(assessFlexPart(noExtension, duty(6.8, 0)).presetMm).toBe(0);
    expect(assessFlexPart(noExtension, duty(6.8, -0.6)).fits).toBe(false);
  });

  it('when no mean diameter is given, then it is estimated larger than the bore and marked as an estimate', () => {
    const a = assessFlexPart(part({ meanDiameterMm: null }), duty(5, -0.5, {}, 1));
    expect(a.meanDiameterEstimated).toBe(true);
    expect(a.meanDiameterMm).toBeGreaterThan(76.2);
  });
});

describe('choosing a part', () => {
  it('when a vibration decoupler is chosen to take growth, then a warning says it is not meant to', () => {
    const a = assessFlexPart(part({ purpose: 'vibration_decoupler' }), duty(5, -0.5));
    expect(a.warnings.map((w) => w.code)).toContain('FLEX_NOT_FOR_GROWTH');
  });

  it('when both fit, then the engine picks the thermal bellows over a shorter decoupler', () => {
    const r = sizeFlex({ ...duty(5, -0.5), coldestAmbientC: -20, tempBasis: 'peak' }, [
      part({ id: 'dec', purpose: 'vibration_decoupler', liveLengthMm: 100 }),
      part({ id: 'bel', liveLengthMm: 150 }),
    ]);
    expect(r.chosen?.id).toBe('bel');
    expect(r.chosenBy).toBe('engine');
  });

  it('when the fabricator picks a part that does not fit, then it stays the run’s part and the reason is given', () => {
    const r = sizeFlex({ ...duty(30, -0.5), coldestAmbientC: -20, tempBasis: 'peak' }, [part({ id: 'small' }), part({ id: 'big', ratedAxialCompressionMm: 60 })], 'small');
    expect(r.chosen?.id).toBe('small');
    expect(r.chosen?.fits).toBe(false);
    expect(r.chosenBy).toBe('fabricator');
    expect(wordPhrase(r.noneFitsReason ?? '', 'metric')).toMatch(/does not fit/);
  });

  it('when heat cycles exceed the part’s rating, then a warning says so; a part with no rating is flagged too', () => {
    expect(assessFlexPart(part(), duty(5, -0.5, { heatCycles: 50_000 })).warnings.map((w) => w.code)).toContain('FLEX_CYCLES_OVER_RATING');
    expect(assessFlexPart(part(), duty(5, -0.5, { heatCycles: 10_000 })).warnings).toEqual([]);
    expect(assessFlexPart(part({ ratedCycles: null }), duty(5, -0.5, { heatCycles: 10 })).warnings.map((w) => w.code)).toContain('FLEX_CYCLES_NOT_RATED');
  });

  it('when the bore is off by more than the fit tolerance, or the part is rated below its temperature, then it does not fit', () => {
    expect(assessFlexPart(part({ boreMm: 76.2 + FLEX_BORE_FIT_TOLERANCE_MM + 0.1 }), duty(5, -0.5)).fits).toBe(false);
    const hotReasons = assessFlexPart(part({ maxTempC: 800 }), duty(5, -0.5)).reasons;
    expect(hotReasons.map((r) => wordPhrase(r, 'metric')).join(' ')).toMatch(/Rated to 800 °C/);
    // 800 °C = 1472 °F (NIST SP 811 §4.2.1.1)
    expect(hotReasons.map((r) => wordPhrase(r, 'imperial')).join(' ')).toMatch(/Rated to 1472 °F/);
  });
});

describe('properties (fast-check)', () => {
  const arbPart = fc.record({
    ratedAxialCompressionMm: fc.double({ min: 0, max: 60, noNaN: true }),
    ratedAxialExtensionMm: fc.double({ min: 0, max: 30, noNaN: true }),
    lateralOffsetMm: fc.double({ min: 0, max: 10, noNaN: true }),
    ratedAngularDeg: fc.double({ min: 0, max: 10, noNaN: true }),
    liveLengthMm: fc.double({ min: 50, max: 400, noNaN: true }),
  });
  const arbDuty = fc.record({
    hot: fc.double({ min: -5, max: 40, noNaN: true }),
    cold: fc.double({ min: -3, max: 0, noNaN: true }),
    lateral: fc.double({ min: 0, max: 5, noNaN: true }),
    rotation: fc.double({ min: 0, max: 5, noNaN: true }),
    share: fc.double({ min: 0.3, max: 1, noNaN: true }),
  });

  it('when a part fits, then its pre-set and every state stay within the share of each rating', () => {
    fc.assert(
      fc.property(arbPart, arbDuty, (p, d) => {
        const a = assessFlexPart(part(p), duty(d.hot, d.cold, { travelShare: d.share }, d.lateral, d.rotation));
        if (!a.fits) return true;
        const preset = a.presetMm as number;
        const eps = 1e-9;
        return (
          preset <= d.share * p.ratedAxialExtensionMm + eps &&
          preset >= -d.share * p.ratedAxialCompressionMm - eps &&
          a.uses.every((u) => u.compressionUse <= d.share + eps && u.extensionUse <= d.share + eps)
        );
      }),
    );
  });

  it('when the movement grows in any direction, then the part’s worst use never falls', () => {
    fc.assert(
      fc.property(arbPart, arbDuty, fc.double({ min: 0, max: 3, noNaN: true }), (p, d, more) => {
        const base = duty(d.hot, d.cold, { travelShare: d.share }, d.lateral, d.rotation);
        const a = assessFlexPart(part(p), base).worstUse;
        const lateral = assessFlexPart(part(p), duty(d.hot, d.cold, { travelShare: d.share }, d.lateral + more, d.rotation)).worstUse;
        const rotation = assessFlexPart(part(p), duty(d.hot, d.cold, { travelShare: d.share }, d.lateral, d.rotation + more)).worstUse;
        return lateral >= a - 1e-9 && rotation >= a - 1e-9;
      }),
    );
  });

  it('when a part fits at a share, then it fits at any larger share', () => {
    fc.assert(
      fc.property(arbPart, arbDuty, fc.double({ min: 0, max: 0.5, noNaN: true }), (p, d, extra) => {
        const strict = assessFlexPart(part(p), duty(d.hot, d.cold, { travelShare: d.share }, d.lateral, d.rotation));
        const loose = assessFlexPart(part(p), duty(d.hot, d.cold, { travelShare: Math.min(1, d.share + extra) }, d.lateral, d.rotation));
        return !strict.fits || loose.fits;
      }),
    );
  });
});
