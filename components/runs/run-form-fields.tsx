import { memo } from 'react';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { FIXED_POINTS } from '../../shared/jobs/fixed-points';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { ChoicePicker } from '../ui/choice-picker';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';
import { UnitNumberField } from '../units/unit-number-field';
import { AlloyPicker } from './alloy-picker';
import type { FieldMessages } from './field-errors';
import { FlangeFields } from './flange-fields';
import { JointFields } from './joint-fields';
import { NearbyField } from './nearby-field';
import { SegmentsField } from './segments-field';
import { SupportsField } from './supports-field';
import { TubeFields } from './tube-fields';

const FIXING_CHOICES = FIXED_POINTS.map((p) => ({ value: p.id, label: p.label }));

export interface RunFormFieldsProps {
  control: Control<RunFields>;
  units: UnitSystem;
  alloyLabel: string | null;
  /** Every field's message (the form's, the server's and the engine's), the same object while unchanged. */
  messages: FieldMessages;
  editable: boolean;
}

/**
 * The run's fields. Each Controller renders again on its own field's changes; the whole list renders
 * again only when the messages, the units or editability change, not on every keystroke of the form.
 */
export const RunFormFields = memo(function RunFormFields({ control, units, alloyLabel, messages, editable }: RunFormFieldsProps) {
  return (
    <>
      <Controller
        control={control}
        name="name"
        render={({ field: { value, onChange, onBlur } }) => (
          <TextField label="Run name" value={value} onChangeText={onChange} onBlur={onBlur} error={messages.name} editable={editable} />
        )}
      />
      <Controller
        control={control}
        name="alloyId"
        render={({ field: { value, onChange } }) => (
          <AlloyPicker value={value} currentLabel={alloyLabel} onChange={onChange} units={units} error={messages.alloyId} disabled={!editable} />
        )}
      />
      <Section title="Tube">
        <Controller
          control={control}
          name="tube"
          render={({ field: { value, onChange } }) => <TubeFields value={value} onChange={onChange} units={units} errors={messages} disabled={!editable} />}
        />
      </Section>
      <Section title="Temperatures along the run" intro="From the run’s start; each segment’s temperature goes straight from start to end.">
        <Controller
          control={control}
          name="installTempC"
          render={({ field: { value, onChange, onBlur } }) => (
            <UnitNumberField
              label="Install temperature"
              kind="temperature"
              units={units}
              value={value}
              onChange={onChange}
              onBlur={onBlur}
              hint="The shop’s temperature when the run is fitted"
              error={messages.installTempC}
              editable={editable}
            />
          )}
        />
        <SegmentsField control={control} units={units} errors={messages} disabled={!editable} />
      </Section>
      <Section title="Ends and joint">
        <Controller
          control={control}
          name="startFixing"
          render={({ field: { value, onChange } }) => (
            <ChoicePicker label="Start held by" choices={FIXING_CHOICES} value={value} onChange={onChange} error={messages.startFixing} disabled={!editable} />
          )}
        />
        <Controller
          control={control}
          name="endFixing"
          render={({ field: { value, onChange } }) => (
            <ChoicePicker label="End held by" choices={FIXING_CHOICES} value={value} onChange={onChange} error={messages.endFixing} disabled={!editable} />
          )}
        />
        <FlangeFields control={control} units={units} errors={messages} disabled={!editable} />
        <JointController control={control} units={units} messages={messages} disabled={!editable} />
      </Section>
      <Section
        title="Supports along the run"
        intro="Where the pipe is carried between its ends; the job page checks them against the joints and the engine flange."
      >
        <SupportsField control={control} units={units} errors={messages} disabled={!editable} />
      </Section>
      <Section title="Near the pipe" intro="Lines, wiring, rubber and panels close to this run; each is checked against its hot gap.">
        <NearbyField control={control} units={units} errors={messages} disabled={!editable} />
      </Section>
      <Controller
        control={control}
        name="notes"
        render={({ field: { value, onChange, onBlur } }) => (
          <TextField label="Notes" value={value} onChangeText={onChange} onBlur={onBlur} error={messages.notes} multiline editable={editable} />
        )}
      />
    </>
  );
});

/** The joint's fields, which alone need the run's peak and tube size: they watch just those. */
function JointController({
  control,
  units,
  messages,
  disabled,
}: {
  control: Control<RunFields>;
  units: UnitSystem;
  messages: FieldMessages;
  disabled: boolean;
}) {
  const [segments, tubeOdMm] = useWatch({ control, name: ['segments', 'tube.odMm'] });
  const peakC = Math.max(...segments.flatMap((s) => [s.startTempC, s.endTempC]).filter(Number.isFinite));
  return (
    <Controller
      control={control}
      name="joint"
      render={({ field: { value, onChange } }) => (
        <JointFields value={value} onChange={onChange} peakC={peakC} tubeOdMm={tubeOdMm} units={units} errors={messages} disabled={disabled} />
      )}
    />
  );
}
