import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, fireEvent, render, screen } from '@testing-library/react-native';
import type { ReactNode } from 'react';
import { RunEditor } from '../../components/runs/run-editor';
import { ApiError } from '../../hooks/api-client';
import type { RunFields } from '../../shared/schemas/jobs';

const run: RunFields = {
  name: 'Downpipe',
  alloyId: 'alloy-321',
  tube: { odMm: 63.5, wallMm: 1.651 },
  installTempC: 20,
  segments: [{ lengthMm: 600, startTempC: 820, endTempC: 700 }],
  startFixing: 'turbo_outlet',
  endFixing: 'v_band',
  joint: { type: 'none' },
  supports: [],
  nearby: [],
  startFlangeAlloyId: null,
  endFlangeAlloyId: null,
  notes: '',
};

// gcTime Infinity: a query cache with a finite gcTime keeps a timer alive after the test ends.
const client = new QueryClient({ defaultOptions: { queries: { retry: false, gcTime: Infinity } } });
afterAll(() => client.clear());

function wrapper({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

beforeAll(() => {
  // No server in this test: every catalogue read fails as if offline, which the editor must survive.
  global.fetch = jest.fn().mockRejectedValue(new TypeError('offline')) as unknown as typeof fetch;
});

describe('RunEditor', () => {
  it('when a save is refused, then the edits stay in the form and the server’s message shows under the field', async () => {
    const onSave = jest
      .fn()
      .mockRejectedValue(new ApiError('conflict', 'This job is archived. Unarchive it to change its runs.', 409, 'job_archived', { name: 'Pick another name' }));
    render(<RunEditor defaultValues={run} units="metric" alloyLabel="Type 321 (S32100)" editable saveLabel="Save changes" onSave={onSave} />, { wrapper });

    fireEvent.changeText(screen.getByLabelText('Run name'), 'Downpipe, hot side');
    fireEvent.changeText(screen.getByLabelText('Length (mm)'), '750');
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Save changes' }));
    });

    expect(onSave).toHaveBeenCalledWith(expect.objectContaining({ name: 'Downpipe, hot side', segments: [{ lengthMm: 750, startTempC: 820, endTempC: 700 }] }));
    expect(await screen.findByText(/This job is archived\. Unarchive it to change its runs\. Your edits are still here\./)).toBeTruthy();
    expect(screen.getByText('Pick another name')).toBeTruthy();
    expect(screen.getByLabelText('Run name').props.value).toBe('Downpipe, hot side');
    expect(screen.getByLabelText('Length (mm)').props.value).toBe('750');
    expect(screen.getByText('Unsaved changes')).toBeTruthy();
  });
});
