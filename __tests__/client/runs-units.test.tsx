import { fireEvent, render, screen } from '@testing-library/react-native';
import { showSigned } from '../../components/units/format';
import { UnitNumberField } from '../../components/units/unit-number-field';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959); 1 K = 1.8 °F as a difference.
const MM_PER_IN = 25.4;

describe('run inputs in the user’s units', () => {
  it('when a fabricator on imperial types 2.5 in as the outside diameter, then the form receives 63.5 mm', () => {
    const onChange = jest.fn();
    render(<UnitNumberField label="Outside diameter" kind="length" units="imperial" value={50} onChange={onChange} />);
    fireEvent.changeText(screen.getByLabelText('Outside diameter (in)'), '2.5');
    const si = onChange.mock.calls[0][0] as number;
    expect(Math.abs(si - 2.5 * MM_PER_IN) / (2.5 * MM_PER_IN)).toBeLessThan(1e-6);
  });

  it('when the user switches from metric to imperial, then the same tube shows in inches and °F', () => {
    const { rerender } = render(<UnitNumberField label="Install temperature" kind="temperature" units="metric" value={20} onChange={jest.fn()} />);
    expect(screen.getByLabelText('Install temperature (°C)').props.value).toBe('20');
    rerender(<UnitNumberField label="Install temperature" kind="temperature" units="imperial" value={20} onChange={jest.fn()} />);
    expect(screen.getByLabelText('Install temperature (°F)').props.value).toBe('68');
  });

  it('when a temperature margin of 100 °C is shown in imperial, then it reads +180 °F, a difference without the 32 °F offset', () => {
    expect(showSigned('temperatureDelta', 100, 'imperial')).toBe('+180 °F');
    expect(showSigned('temperatureDelta', -25, 'metric')).toBe('−25 °C');
  });
});
