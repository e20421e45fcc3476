import { act, fireEvent, render, screen } from '@testing-library/react-native';
import { AlloyForm } from '../../components/alloys/alloy-form';
import { ApiError } from '../../hooks/api-client';
import type { AlloyInput, SourceView } from '../../shared/schemas/alloy';

const source: SourceView = {
  id: 'src-1',
  key: null,
  kind: 'datasheet',
  title: 'Mill data sheet, Type 321 tube',
  issuer: 'A tube mill',
  edition: '2024',
  url: null,
  note: '',
  datasheetId: null,
};

const type321: AlloyInput = {
  designation: 'Type 321',
  uns: 'S32100',
  family: 'austenitic_stainless',
  densityKgM3: 7920,
  densitySourceId: 'src-1',
  maxContinuousC: 925,
  maxIntermittentC: 900,
  limitsSourceId: 'src-1',
  pricePerKg: 6.4,
  currency: 'EUR',
  priceSetOn: '2026-11-01',
  priceIsDemo: true,
  referenceTempC: 20,
  notes: '',
  dataCautions: '',
  warningRanges: [],
  cte: [
    { tempC: 100, meanUmPerMK: 16.6, sourceId: 'src-1' },
    { tempC: 600, meanUmPerMK: 18.9, sourceId: 'src-1' },
  ],
  modulus: [],
  yield: [],
};

function renderForm(onSubmit: jest.Mock) {
  render(
    <AlloyForm
      defaultValues={type321}
      sources={[source]}
      onCreateSource={jest.fn()}
      onSubmit={onSubmit}
      submitLabel="Save draft"
      units="metric"
    />,
  );
}

describe('AlloyForm', () => {
  it('when the server refuses a table value, then its message shows under that field and the edits stay', async () => {
    const onSubmit = jest.fn().mockRejectedValue(
      new ApiError('invalid', 'Some values need attention.', 400, 'invalid_input', {
        'cte.1.meanUmPerMK': 'Checked against the mill sheet: not this value',
      }),
    );
    renderForm(onSubmit);

    fireEvent.changeText(screen.getByLabelText('Density (kg/m³)'), '7930');
    fireEvent.changeText(screen.getByLabelText('Note for this change'), 'From the mill sheet');
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Save draft' }));
    });

    expect(onSubmit).toHaveBeenCalledWith(expect.objectContaining({ densityKgM3: 7930 }), 'From the mill sheet');
    expect(await screen.findByText('Checked against the mill sheet: not this value')).toBeOnTheScreen();
    expect(screen.getByText('Some values need attention.')).toBeOnTheScreen();
    expect(screen.getByLabelText('Density (kg/m³)').props.value).toBe('7930');
    expect(screen.getByLabelText('Mean CTE (µm/m·K), row 2').props.value).toBe('18.9');
  });

  it('when the density is cleared, then the field says so and nothing is sent', async () => {
    const onSubmit = jest.fn();
    renderForm(onSubmit);

    fireEvent.changeText(screen.getByLabelText('Density (kg/m³)'), '');
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Save draft' }));
    });

    expect(await screen.findByText('Density must be a number')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('when an expansion row is removed below two, then the table asks for at least two points', async () => {
    const onSubmit = jest.fn();
    renderForm(onSubmit);

    fireEvent.press(screen.getByRole('button', { name: 'Remove mean cte row 2' }));
    await act(async () => {
      fireEvent.press(screen.getByRole('button', { name: 'Save draft' }));
    });

    expect(await screen.findByText('Give at least two expansion points')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });
});
