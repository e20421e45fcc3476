import { DEFAULT_MOVEMENT_MARGIN, FLEX_BORE_FIT_TOLERANCE_MM, MOVEMENT_MARGIN_NOTE, assessFlexPart, sizeFlex } from '../../shared/engine/flex';
import type { FlexPart, Segment } from '../../shared/engine/types';

// Fixture parts to exercise the selection rules: catalogue-like, not data.
const part = (over: Partial<FlexPart>): FlexPart => ({
  id: 'p',
  name: 'part',
  boreMm: 76.2,
  liveLengthMm: 150,
  ratedAxialCompressionMm: 20,
  ratedAxialExtensionMm: 20,
  lateralOffsetMm: 5,
  maxTempC: 900,
  price: 100,
  ...over,
});
const segments: Segment[] = [
  { lengthMm: 400, startTempC: 880, endTempC: 700 },
  { lengthMm: 600, startTempC: 700, endTempC: 400 },
];
const OD = 76.2;

describe('flex sizing', () => {
  it('when no margin is given, then the required movement is growth × 1.25, labelled common practice with no published source', () => {
    const r = sizeFlex(10, OD, segments, 880, {});
    expect(DEFAULT_MOVEMENT_MARGIN).toBe(1.25);
    expect(r.movementMargin).toBe(DEFAULT_MOVEMENT_MARGIN);
    expect(r.requiredMovementMm).toBeCloseTo(10 * DEFAULT_MOVEMENT_MARGIN, 12);
    expect(r.movementMarginNote).toBe(MOVEMENT_MARGIN_NOTE);
    expect(MOVEMENT_MARGIN_NOTE).toMatch(/common practice, no published source/i);
  });

  it('when the caller sets a margin, then it is used', () => {
    expect(sizeFlex(10, OD, segments, 880, { movementMargin: 2 }).requiredMovementMm).toBe(20);
  });

  it('when the part has room, then it is pre-stretched by the growth so the hot position is neutral', () => {
    const a = assessFlexPart(part({}), 8, 1.25, OD, 880);
    expect(a.fits).toBe(true);
    expect(a.presetMm).toBe(8);
    expect(a.hotPositionMm).toBe(0);
  });

  it('when the extension rating is short, then the pre-set stops at it and the hot position is compressed', () => {
    const a = assessFlexPart(part({ ratedAxialExtensionMm: 5, ratedAxialCompressionMm: 20 }), 8, 1.25, OD, 880);
    expect(a.presetMm).toBe(5);
    expect(a.hotPositionMm).toBe(-3);
    expect(a.fits).toBe(true);
  });

  it('when travel × margin exceeds the envelope, then the part is refused with the reason', () => {
    const a = assessFlexPart(part({ ratedAxialExtensionMm: 5, ratedAxialCompressionMm: 4 }), 8, 1.25, OD, 880);
    expect(a.fits).toBe(false);
    expect(a.reasons.join(' ')).toMatch(/travel/);
  });

  it('when parts differ, then the shortest part that fits bore, temperature and travel is chosen', () => {
    const parts = [
      part({ id: 'long', liveLengthMm: 300 }),
      part({ id: 'short-wrong-bore', liveLengthMm: 100, boreMm: OD + FLEX_BORE_FIT_TOLERANCE_MM + 0.5 }),
      part({ id: 'short-too-cool', liveLengthMm: 100, maxTempC: 700 }),
      part({ id: 'short-too-stiff', liveLengthMm: 100, ratedAxialCompressionMm: 1, ratedAxialExtensionMm: 1 }),
      part({ id: 'mid', liveLengthMm: 200, boreMm: OD - FLEX_BORE_FIT_TOLERANCE_MM }),
    ];
    const r = sizeFlex(8, OD, segments, 880, { parts });
    expect(r.chosen?.id).toBe('mid');
    const reasons = Object.fromEntries(r.candidates.map((c) => [c.id, c.reasons.join(' ')]));
    expect(reasons['short-wrong-bore']).toMatch(/Bore/);
    expect(reasons['short-too-cool']).toMatch(/Rated to 700/);
    expect(reasons['short-too-stiff']).toMatch(/travel/);
  });

  it('when the flex position is given, then its rating is checked at the temperature there, not the peak', () => {
    const cool = part({ id: 'cool', maxTempC: 650 });
    expect(sizeFlex(8, OD, segments, 880, { parts: [cool] }).chosen).toBeNull();
    const downstream = sizeFlex(8, OD, segments, 880, { parts: [cool], atMm: 800 });
    expect(downstream.tempBasis).toBe('location');
    expect(downstream.tempAtFlexC).toBeCloseTo(500, 10);
    expect(downstream.chosen?.id).toBe('cool');
  });

  it('when nothing fits, then the answer says so plainly', () => {
    const r = sizeFlex(8, OD, segments, 880, { parts: [part({ boreMm: 50 })] });
    expect(r.chosen).toBeNull();
    expect(r.noneFitsReason).toMatch(/None of the 1 flex part/);
  });

  it('when inline parts are absent, then the catalogue list is used', () => {
    expect(sizeFlex(8, OD, segments, 880, {}, [part({ id: 'cat' })]).chosen?.id).toBe('cat');
  });
});
