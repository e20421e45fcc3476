import { render, screen } from '@testing-library/react-native';
import { AlloyCharts } from '../../components/alloys/alloy-charts';
import { limitMarking } from '../../components/alloys/limit-marker';
import type { AlloyVersionView } from '../../shared/schemas/alloy';

/** An invented austenitic grade: limit 925 °C, expansion data to `topC`, a constant mean coefficient of 17.0 µm/m·K from 20 °C. */
const version = (topC: number): AlloyVersionView => ({
  versionId: 'v1', version: 1, state: 'published', createdAt: '2026-12-01T00:00:00Z', createdBy: null, publishedAt: null, publishedBy: null,
  designation: 'Trial grade', uns: 'S99999', family: 'austenitic_stainless', densityKgM3: 7900, densitySourceId: 's1', maxContinuousC: 925, maxIntermittentC: 870,
  limitsSourceId: 's1', pricePerKg: 5, currency: 'EUR', priceSetOn: '2026-12-01', priceIsDemo: true, referenceTempC: 20, notes: '', dataCautions: '', warningRanges: [],
  cte: [100, 400, topC].map((tempC) => ({ tempC, meanUmPerMK: 17, sourceId: 's1' })),
  modulus: [],
  yield: [],
});

describe('the growth chart’s limit marker', () => {
  it('when the data stop at 800 °C below a 925 °C limit, then the marker names the data’s end and the limit is said apart', () => {
    const marking = limitMarking(version(800), 'metric');
    // Mean coefficient by definition: ΔL/L = α_mean × (T − 20 °C) = 17.0e-6 × 780 K = 13.26 mm per metre.
    expect(marking.marker?.tempC).toBe(800);
    expect(marking.marker?.growth).toBeCloseTo(13.26, 6);
    expect(marking.marker?.label).toBe('End of the data 800 °C: 13.26 mm/m');
    expect(marking.note).toBe('Continuous limit 925 °C: above the data, so not drawn.');

    render(<AlloyCharts version={version(800)} units="metric" />);
    expect(screen.getByText('Continuous limit 925 °C: above the data, so not drawn.')).toBeOnTheScreen();
    expect(screen.queryByText(/^Continuous limit 800 °C/)).toBeNull();
  });

  it('when the data reach past the limit, then the marker sits on the limit and there is no note', () => {
    const marking = limitMarking(version(1000), 'metric');
    // 17.0e-6 × (925 − 20) K = 15.385 mm per metre.
    expect(marking.marker?.tempC).toBe(925);
    expect(marking.marker?.growth).toBeCloseTo(15.385, 6);
    expect(marking.marker?.label).toBe('Continuous limit 925 °C: 15.39 mm/m');
    expect(marking.note).toBeNull();
  });
});
