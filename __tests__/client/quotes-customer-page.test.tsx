import { phrase, quantity } from '../../shared/units';
import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { PublicQuotePage } from '../../components/quotes/public-quote-page';
import { RunOverrides } from '../../components/quotes/run-overrides';
import { ApiError } from '../../hooks/api-client';
import type { PublicQuoteView } from '../../shared/schemas/quotes';

const alloy = (designation: string, uns: string) => ({
  designation,
  uns,
  familyLabel: 'Austenitic stainless',
  serviceLimitC: 870,
  plainWords: phrase`${designation} is good for about ${quantity('temperature', 870)} in air.`,
});

const option = (label: string, total: number, uns: string) => ({
  label,
  total,
  costDifference: total - 400,
  costDifferencePct: ((total - 400) / 400) * 100,
  massKg: 2.2,
  massDifferenceKg: 0,
  tempMarginC: 90,
  tempMarginGainedC: 0,
  limitState: 'ok' as const,
  limitCaution: null,
  acceptable: true,
  alloys: [alloy(label.split(' throughout')[0], uns)],
});

const quote: PublicQuoteView = {
  number: 'Q-2026-0007',
  shopName: 'Invented Pipe Shop',
  customerName: 'Ria Thorn',
  customerCompany: '',
  jobName: 'Demo downpipe',
  validUntil: '2026-12-31',
  message: '',
  status: 'viewed',
  currency: 'EUR',
  acceptedOptionIndex: null,
  units: 'metric',
  options: [option('Type 321 throughout', 400, 'S32100'), option('Type 347 throughout', 450, 'S34700')],
};

describe('the customer’s quote page', () => {
  it('when the customer accepts option 2 with their name, then the decision names that option and the person', async () => {
    const onDecide = jest.fn().mockResolvedValue(undefined);
    render(<PublicQuotePage quote={quote} onDecide={onDecide} />);

    fireEvent.press(screen.getByRole('button', { name: 'Accept option 2' }));
    fireEvent.changeText(screen.getByLabelText('Your name'), 'Ria Thorn');
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Confirm: accept option 2' }));
    });

    expect(onDecide).toHaveBeenCalledWith({ accept: true, optionIndex: 1, name: 'Ria Thorn' });
  });

  it('when the name is left empty, then nothing is sent and the field says why', async () => {
    const onDecide = jest.fn();
    render(<PublicQuotePage quote={quote} onDecide={onDecide} />);

    fireEvent.press(screen.getByRole('button', { name: 'Accept option 1' }));
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Confirm: accept option 1' }));
    });

    expect(await screen.findByText('Enter your name')).toBeOnTheScreen();
    expect(onDecide).not.toHaveBeenCalled();
  });

  it('when the quote was already decided elsewhere, then the refusal is shown plainly and what was typed stays', async () => {
    const onDecide = jest.fn().mockRejectedValue(new ApiError('conflict', 'This quote was already accepted.', 409, 'already_decided'));
    render(<PublicQuotePage quote={quote} onDecide={onDecide} />);

    fireEvent.press(screen.getByRole('button', { name: 'Decline' }));
    fireEvent.changeText(screen.getByLabelText('Your name'), 'Ria Thorn');
    fireEvent.changeText(screen.getByLabelText('Reason (optional)'), 'Went with a rebuild');
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Confirm: decline the quote' }));
    });

    expect(onDecide).toHaveBeenCalledWith({ accept: false, name: 'Ria Thorn', reason: 'Went with a rebuild' });
    expect(await screen.findByRole('alert')).toHaveTextContent(/already accepted\. Nothing more is needed from you\./);
    expect(screen.getByLabelText('Reason (optional)').props.value).toBe('Went with a rebuild');
  });

  it('when the salesperson works in imperial and the customer has not chosen, then the quote opens in °F', () => {
    // 870 °C = 870 × 9/5 + 32 = 1598 °F (the definition of the Fahrenheit scale).
    render(<PublicQuotePage quote={{ ...quote, units: 'imperial' }} onDecide={jest.fn()} />);
    expect(screen.getAllByText(/1,?598 °F/).length).toBeGreaterThan(0);
    expect(screen.queryByText(/870 °C/)).toBeNull();
  });

  it('when the salesperson works in metric, then the quote opens in °C', () => {
    render(<PublicQuotePage quote={quote} onDecide={jest.fn()} />);
    expect(screen.getAllByText(/870 °C/).length).toBeGreaterThan(0);
  });

  it('when the quote is accepted, then the page says which option and offers no more buttons', () => {
    render(<PublicQuotePage quote={{ ...quote, status: 'accepted', acceptedOptionIndex: 1 }} onDecide={jest.fn()} />);

    expect(screen.getByText(/You accepted option 2, Type 347 throughout/)).toBeOnTheScreen();
    expect(screen.queryByRole('button', { name: /Accept option/ })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Decline' })).toBeNull();
  });
});

describe('per-run alloys in an option', () => {
  const runs = [
    { id: 'run-a', name: 'Downpipe' },
    { id: 'run-b', name: 'Mid-pipe' },
  ];
  const choices = [
    { value: 'alloy-321', label: 'Type 321 (S32100)' },
    { value: 'alloy-625', label: 'Alloy 625 (N06625)' },
  ];

  it('when one run is given another alloy, then only that run is listed; setting it back removes it', () => {
    const onChange = jest.fn();
    const { rerender } = render(<RunOverrides optionNumber={2} runs={runs} alloyChoices={choices} value={{}} onChange={onChange} />);

    fireEvent.press(screen.getByRole('button', { name: 'Different alloy for some runs of option 2' }));
    fireEvent.press(screen.getByRole('button', { name: 'Alloy for Downpipe' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Alloy 625 (N06625)' }));
    expect(onChange).toHaveBeenLastCalledWith({ 'run-a': 'alloy-625' });

    rerender(<RunOverrides optionNumber={2} runs={runs} alloyChoices={choices} value={{ 'run-a': 'alloy-625' }} onChange={onChange} />);
    fireEvent.press(screen.getByRole('button', { name: 'Alloy for Downpipe' }));
    fireEvent.press(screen.getByRole('radio', { name: 'Same as the option' }));
    expect(onChange).toHaveBeenLastCalledWith({});
  });
});
