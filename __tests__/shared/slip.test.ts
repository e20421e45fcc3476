import { prepareStrainCurve, strainChange } from '../../shared/engine/expansion';
import { DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE, sizeSlip } from '../../shared/engine/slip';
import type { SlipInput } from '../../shared/engine/types';
import { constantAlphaAlloy, stainless304 } from './published';

const s304 = prepareStrainCurve(stainless304());
const input = (over: Partial<SlipInput> = {}): SlipInput => ({
  inner: { tempC: 850, diameterMm: 63.5 },
  outer: { tempC: 700 },
  coldClearanceMm: 0.15,
  coldEngagementMm: 70,
  coldAxialGapMm: 10,
  ...over,
});

describe('slip joint, differential diametral growth (reference-data §4.2, derived from EN Annex C)', () => {
  // 304, 63.5 mm: spigot at 850 °C grows 1.011 mm, socket at 700 °C 0.809 mm, so the cold clearance must exceed 0.201 mm.
  it('when the spigot runs at 850 °C in a socket at 700 °C, then the differential growth is 0.201 mm', () => {
    const r = sizeSlip(input({ outer: { tempC: 700, diameterMm: 63.5 } }), { inner: s304, outer: s304 }, 5, 63.5, 20);
    expect(r.innerDiametralGrowthMm).toBeCloseTo(1.011, 3);
    expect(r.outerDiametralGrowthMm).toBeCloseTo(0.809, 3);
    expect(r.differentialDiametralGrowthMm).toBeCloseTo(0.201, 3);
  });

  it('when the cold clearance is below the differential, then it seizes; above it, ok', () => {
    const mats = { inner: s304, outer: s304 };
    expect(sizeSlip(input({ coldClearanceMm: 0.15 }), mats, 5, 63.5, 20).verdict).toBe('seizes');
    expect(sizeSlip(input({ coldClearanceMm: 0.3 }), mats, 5, 63.5, 20).verdict).toBe('ok');
  });

  it('when the sleeve alloy expands less than the tube alloy at equal temperature, then the spigot closes the clearance', () => {
    // 409 (1.4512) α̅ 12.0 to 500 °C (reference-data §1.4) around a 304 spigot, both at 500 °C.
    const ferritic = prepareStrainCurve(constantAlphaAlloy(12.0e-6));
    const r = sizeSlip(input({ inner: { tempC: 500 }, outer: { tempC: 500 }, coldClearanceMm: 0.1 }), { inner: s304, outer: ferritic }, 5, 63.5, 20);
    const want = 63.5 * strainChange(s304, 500, 20) - 63.6 * strainChange(ferritic, 500, 20);
    expect(r.outerDiameterMm).toBeCloseTo(63.6, 12);
    expect(want).toBeGreaterThan(0.1);
    expect(r.differentialDiametralGrowthMm).toBeCloseTo(want, 12);
    expect(r.verdict).toBe('seizes');
  });
});

describe('slip joint, axial', () => {
  const mats = { inner: s304, outer: s304 };

  it('when the run grows less than the gap, then the gap closes by the growth and engagement rises by it', () => {
    const r = sizeSlip(input({ coldClearanceMm: 0.3 }), mats, 6, 63.5, 20);
    expect(r.hotAxialClosureMm).toBe(6);
    expect(r.bottomsOut).toBe(false);
    expect(r.hotEngagementMm).toBe(76);
  });

  it('when the run grows more than the gap, then it bottoms out and engagement stops at the gap', () => {
    const r = sizeSlip(input(), mats, 12, 63.5, 20);
    expect(r.bottomsOut).toBe(true);
    expect(r.hotEngagementMm).toBe(80);
  });

  it('when no minimum is given, then it is 1 × the tube OD (common practice, no published source) and engagement is judged against it', () => {
    expect(DEFAULT_MIN_ENGAGEMENT_OD_MULTIPLE).toBe(1);
    const r = sizeSlip(input(), mats, 6, 63.5, 20);
    expect(r.minEngagementMm).toBe(63.5);
    expect(r.engagementOk).toBe(true);
    expect(sizeSlip(input({ coldEngagementMm: 50 }), mats, 6, 63.5, 20).engagementOk).toBe(false);
    expect(sizeSlip(input({ coldEngagementMm: 50, minEngagementMm: 40 }), mats, 6, 63.5, 20).engagementOk).toBe(true);
  });
});
