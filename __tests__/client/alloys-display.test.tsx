import { render, screen } from '@testing-library/react-native';
import { describeDiff, sourceMap } from '../../components/alloys/diff-text';
import { AlloyProperties } from '../../components/alloys/alloy-properties';
import { indexSources } from '../../components/alloys/source-citation';
import { UploadProgress } from '../../components/alloys/upload-progress';
import type { AlloyVersionView, SourceView } from '../../shared/schemas/alloy';

const sources = sourceMap([
  { id: 's1', key: null, kind: 'handbook', title: 'Stainless handbook, thermal tables', issuer: 'A society', edition: '2019', url: null, note: '', datasheetId: null } satisfies SourceView,
]);

describe('catalogue display', () => {
  it('when a density changes, then the diff reads in words and kg/m³', () => {
    expect(describeDiff({ path: 'densityKgM3', before: 7960, after: 7970 }, sources, 'metric')).toEqual({
      label: 'Density',
      before: '7960 kg/m³',
      after: '7970 kg/m³',
    });
  });

  it('when a table point changes, then the diff names the temperature, the value and its source', () => {
    const line = describeDiff({ path: 'cte@600 °C', before: { value: 18.9, sourceId: 's1' }, after: { value: 19.1, sourceId: 's1' } }, sources, 'metric');
    expect(line.label).toBe('Mean CTE at 600 °C');
    expect(line.before).toBe('18.90 µm/m·K (Stainless handbook, thermal tables, A society, 2019)');
    expect(line.after).toBe('19.10 µm/m·K (Stainless handbook, thermal tables, A society, 2019)');
  });

  it('when a limit is shown in imperial, then it converts through the shared units', () => {
    // 1000 °C = 1832 °F (exact: 1000 × 9/5 + 32).
    expect(describeDiff({ path: 'maxContinuousC', before: 1000, after: null }, sources, 'imperial')).toEqual({
      label: 'Continuous service limit',
      before: '1832 °F',
      after: '—',
    });
  });

  it('when an alloy has cautions and values from memory, then the top of its properties says so in words', () => {
    const memory: SourceView = { id: 'm1', key: 'memory', kind: 'memory', title: 'From memory — to be verified', issuer: '', edition: '', url: null, note: '', datasheetId: null };
    const version = {
      versionId: 'v1', version: 1, state: 'published', createdAt: '2026-12-01T00:00:00Z', createdBy: null, publishedAt: null, publishedBy: null,
      designation: 'Type 409', uns: 'S40910', family: 'ferritic_stainless', densityKgM3: 7700, densitySourceId: 's1', maxContinuousC: 450, maxIntermittentC: 450,
      limitsSourceId: 'm1', pricePerKg: 9, currency: 'EUR', priceSetOn: '2026-12-01', priceIsDemo: true, referenceTempC: 20, notes: '', warningRanges: [],
      dataCautions: 'Usable limit lowered to 450 °C: the expansion data found stop at 500 °C.',
      cte: [{ tempC: 100, meanUmPerMK: 10.5, sourceId: 's1' }, { tempC: 500, meanUmPerMK: 12, sourceId: 's1' }],
      modulus: [{ tempC: 20, gpa: 220, sourceId: 's1' }],
      yield: [{ tempC: 20, mpa: 210, sourceId: 'm1' }],
    } satisfies AlloyVersionView;
    const index = indexSources(['s1', 'm1'], [...sources.values(), memory]);
    render(<AlloyProperties version={version} index={index} units="metric" />);
    expect(screen.getByLabelText('Data cautions')).toBeOnTheScreen();
    expect(screen.getByText(/Usable limit lowered to 450 °C/)).toBeOnTheScreen();
    expect(screen.getByText('service limits; yield at 20 °C')).toBeOnTheScreen();
  });

  it('when part of a file is sent, then the bar says how much, by name', () => {
    render(<UploadProgress fraction={0.466} />);
    const bar = screen.getByRole('progressbar', { name: 'Upload progress' });
    expect(bar.props['aria-valuenow']).toBe(47);
    expect(screen.getByText('47 %')).toBeOnTheScreen();
  });
});
