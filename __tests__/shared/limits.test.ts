import { CAUTION_MARGIN_C, limitWarnings, peakTempC, temperatureLimit, warningRangesHit } from '../../shared/engine/limits';
import { stainless304 } from './published';
import { wordPhrase } from '../../shared/units';

// 304 service limits in air: 870 °C intermittent, 925 °C continuous (reference-data §3.1, [SEEN] stockholder and supplier data).
const alloy304 = stainless304();

describe('temperature limits', () => {
  it('when the peak is well below the lower (intermittent) limit, then the status is ok with the margin in °C', () => {
    const peak = 870 - CAUTION_MARGIN_C - 1;
    const l = temperatureLimit(alloy304, peak);
    expect(l).toMatchObject({ status: 'ok', marginC: CAUTION_MARGIN_C + 1, governingC: 870, governedBy: 'intermittent', continuousC: 925, intermittentC: 870 });
    expect(limitWarnings(l, peak)).toEqual([]);
  });

  it('when the peak is within the caution band, then the status is caution and a warning says so', () => {
    const peak = 870 - CAUTION_MARGIN_C / 2;
    const l = temperatureLimit(alloy304, peak);
    expect(l.status).toBe('caution');
    expect(limitWarnings(l, peak)[0].code).toBe('TEMP_NEAR_LIMIT');
  });

  it('when the peak exceeds the intermittent limit but not the continuous one, then the status is over', () => {
    const l = temperatureLimit(alloy304, 900);
    expect(l.status).toBe('over');
    expect(l.marginC).toBe(-30);
    expect(wordPhrase(limitWarnings(l, 900)[0].message, 'metric')).toMatch(/30 °C above/);
  });

  it('when continuous is the lower limit (ferritic grades), then it governs', () => {
    // 430: 815 °C continuous [SEEN supplier page]; 870 °C intermittent [MEMORY] (reference-data §3.1).
    const l = temperatureLimit({ maxContinuousC: 815, maxIntermittentC: 870 }, 800);
    expect(l.governedBy).toBe('continuous');
    expect(l.marginC).toBe(15);
  });

  it('when the caution band is changed, then the status follows it', () => {
    expect(temperatureLimit(alloy304, 850, 10).status).toBe('ok');
    expect(temperatureLimit(alloy304, 850, 30).status).toBe('caution');
  });
});

describe("the alloy's warning ranges", () => {
  it('when the run passes through the carbide-precipitation range (SSINA: 427–871 °C for the 300 series), then the warning is raised', () => {
    expect(warningRangesHit(alloy304, [{ lengthMm: 500, startTempC: 880, endTempC: 790 }]).map((w) => w.code)).toEqual(['CARBIDE_PRECIPITATION']);
  });

  it('when the whole run stays below or above the range, then no warning', () => {
    expect(warningRangesHit(alloy304, [{ lengthMm: 500, startTempC: 300, endTempC: 400 }])).toEqual([]);
    expect(warningRangesHit(alloy304, [{ lengthMm: 500, startTempC: 900, endTempC: 880 }])).toEqual([]);
  });

  it('when segments differ, then the peak is the hottest end of any segment', () => {
    expect(peakTempC([{ lengthMm: 1, startTempC: 300, endTempC: 650 }, { lengthMm: 1, startTempC: 640, endTempC: 200 }])).toBe(650);
  });
});
