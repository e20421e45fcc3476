import { type Control, Controller, useWatch } from 'react-hook-form';
import { isFlanged } from '../../shared/welds/weld-sites';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { AlloyPicker } from './alloy-picker';
import type { FieldMessages } from './field-errors';

export interface FlangeFieldsProps {
  control: Control<RunFields>;
  units: UnitSystem;
  errors: FieldMessages;
  disabled: boolean;
}

const ENDS = [
  { name: 'startFlangeAlloyId', fixing: 'startFixing', label: 'Start flange alloy' },
  { name: 'endFlangeAlloyId', fixing: 'endFixing', label: 'End flange alloy' },
] as const;

/** What each flanged end's flange is made of, for the weld plan; shown only where the end carries a flange. */
export function FlangeFields({ control, units, errors, disabled }: FlangeFieldsProps) {
  const [startFixing, endFixing] = useWatch({ control, name: ['startFixing', 'endFixing'] });
  const fixings = { startFixing, endFixing };
  return (
    <>
      {ENDS.filter((end) => isFlanged(fixings[end.fixing])).map((end) => (
        <Controller
          key={end.name}
          control={control}
          name={end.name}
          render={({ field: { value, onChange } }) => (
            <AlloyPicker
              label={end.label}
              emptyLabel="Same as the tube"
              value={value ?? ''}
              currentLabel={null}
              onChange={(id) => onChange(id || null)}
              units={units}
              error={errors[end.name]}
              disabled={disabled}
            />
          )}
        />
      ))}
    </>
  );
}
