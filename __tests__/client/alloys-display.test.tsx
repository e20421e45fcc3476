import { render, screen } from '@testing-library/react-native';
import { describeDiff, sourceMap } from '../../components/alloys/diff-text';
import { UploadProgress } from '../../components/alloys/upload-progress';
import type { SourceView } from '../../shared/schemas/alloy';

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

  it('when part of a file is sent, then the bar says how much, by name', () => {
    render(<UploadProgress fraction={0.466} />);
    const bar = screen.getByRole('progressbar', { name: 'Upload progress' });
    expect(bar.props['aria-valuenow']).toBe(47);
    expect(screen.getByText('47 %')).toBeOnTheScreen();
  });
});
