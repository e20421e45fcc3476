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
    expect(screen.getByText('name: Down → Downpipe')).toBeTruthy();
    expect(screen.getByText('Job “Road car” created')).toBeTruthy();
  });

  it('when nothing is recorded, then it says so', () => {
    render(<ActivityList items={[]} label="Activity" />);
    expect(screen.getByText('Nothing recorded yet.')).toBeTruthy();
  });
});
