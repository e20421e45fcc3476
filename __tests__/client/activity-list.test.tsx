import { render, screen } from '@testing-library/react-native';
import { ActivityList } from '../../components/ui/activity-list';
import type { ActivityView } from '../../shared/schemas/activity';

const items: ActivityView[] = [
  { id: 'a2', subject: 'run', subjectId: 'r1', subjectName: 'Downpipe', action: 'edited', at: '2026-11-02T10:00:00.000Z', by: 'Erin Engineer', changes: [{ path: 'name', before: 'Down', after: 'Downpipe' }] },
  { id: 'a1', subject: 'job', subjectId: 'j1', subjectName: 'Road car', action: 'created', at: '2026-11-01T10:00:00.000Z', by: 'Fran Fabricator', changes: [] },
];

describe('ActivityList', () => {
  it('when a job has changes, then each says what changed, by whom, and the fields before and after', () => {
    render(<ActivityList items={items} label="Activity" />);
    expect(screen.getByText('Run “Downpipe” edited')).toBeTruthy();
    expect(screen.getByText(/Erin Engineer/)).toBeTruthy();
    expect(screen.getByText('Name: Down → Downpipe')).toBeTruthy();
    expect(screen.getByText('Job “Road car” created')).toBeTruthy();
  });

  it('when a run’s measured fields changed, then an imperial reader sees them named and in inches and °F', () => {
    const edited: ActivityView = {
      ...items[0],
      changes: [
        { path: 'segments', before: [{ lengthMm: 600, startTempC: 820, endTempC: 700 }], after: [{ lengthMm: 900, startTempC: 820, endTempC: 700 }] },
        { path: 'installTempC', before: 20, after: 25 },
        { path: 'tube', before: { odMm: 63.5, wallMm: 1.65 }, after: { odMm: 63.5, wallMm: 2 } },
        { path: 'alloyId', before: 'a-1', after: 'a-2' },
      ],
    };
    render(<ActivityList items={[edited]} label="Activity" units="imperial" />);
    // NIST SP 811 (2008) App. B: 1 in = 25.4 mm exactly; §4.2.1.1 t/°F = t/°C × 9/5 + 32. Worked by hand:
    // 600 mm = 23.62 in, 900 mm = 35.43 in; 820 °C = 1508 °F, 700 °C = 1292 °F; 20 °C = 68 °F, 25 °C = 77 °F;
    // 63.5 mm = 2.50 in; 1.65 mm = 0.065 in, 2 mm = 0.079 in.
    expect(screen.getByText('Segments: length 23.62 in, start 1508 °F, end 1292 °F → length 35.43 in, start 1508 °F, end 1292 °F')).toBeTruthy();
    expect(screen.getByText('Install temperature: 68 °F → 77 °F')).toBeTruthy();
    expect(screen.getByText('Tube: OD 2.50 in, wall 0.065 in → OD 2.50 in, wall 0.079 in')).toBeTruthy();
    // An alloy is a reference: its id means nothing to a reader.
    expect(screen.getByText('Alloy changed')).toBeTruthy();
  });

  it('when a margin or a fit changed, then a margin is a difference (50 °C = 90 °F) and a fit keeps its fine precision', () => {
    const edited: ActivityView = {
      ...items[0],
      changes: [
        { path: 'joint', before: { type: 'slip', coldClearanceMm: 0.245, marginC: 50 }, after: { type: 'slip', coldClearanceMm: 0.3, marginC: 50 } },
        { path: 'options.1.limitOverride', before: null, after: 'Show car only' },
      ],
    };
    render(<ActivityList items={[edited]} label="Activity" units="imperial" />);
    // 50 °C difference × 9/5 = 90 °F (NIST SP 811 §4.2.1.1); 0.245 mm = 0.0096 in, 0.3 mm = 0.0118 in.
    expect(screen.getByText('Joint: type slip, cold clearance 0.0096 in, margin 90 °F → type slip, cold clearance 0.0118 in, margin 90 °F')).toBeTruthy();
    expect(screen.getByText('Option 2 limit override: — → Show car only')).toBeTruthy();
  });

  it('when nothing is recorded, then it says so', () => {
    render(<ActivityList items={[]} label="Activity" />);
    expect(screen.getByText('Nothing recorded yet.')).toBeTruthy();
  });
});
