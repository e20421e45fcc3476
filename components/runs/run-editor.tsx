import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { Platform, StyleSheet, useWindowDimensions, View, type ViewStyle } from 'react-native';
import { layout, spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { FIXED_POINTS } from '../../shared/jobs/fixed-points';
import { runFieldsSchema, type RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Section } from '../ui/section';
import { ChoicePicker } from '../ui/choice-picker';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { UnitNumberField } from '../units/unit-number-field';
import { AlloyPicker } from './alloy-picker';
import { FlangeFields } from './flange-fields';
import { NearbyField } from './nearby-field';
import { SupportsField } from './supports-field';
import { flattenErrors, mergeMessages, type FieldMessages } from './field-errors';
import { JointFields } from './joint-fields';
import { LiveRunResults } from './live-run-results';
import { SegmentsField } from './segments-field';
import { TubeFields } from './tube-fields';
import { useCheckedForm } from '../forms/use-checked-form';

const FIXING_CHOICES = FIXED_POINTS.map((p) => ({ value: p.id, label: p.label }));

export interface RunEditorProps {
  defaultValues: RunFields;
  units: UnitSystem;
  /** The alloy's name as last saved, shown before the catalogue list loads. */
  alloyLabel: string | null;
  editable: boolean;
  saveLabel: string;
  /** Saves the run; a rejection keeps every edit on screen with the server's messages. */
  onSave: (values: RunFields) => Promise<unknown>;
}

/** The run's inputs with its results beside them (under them on a phone), recomputed as the person types. */
export function RunEditor({ defaultValues, units, alloyLabel, editable, saveLabel, onSave }: RunEditorProps) {
  const wide = useWindowDimensions().width >= layout.wideBreakpoint;
  const [failure, setFailure] = useState<string>();
  const [serverFields, setServerFields] = useState<FieldMessages>({});
  const [saved, setSaved] = useState(false);
  const {
    control,
    handleSubmit,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useCheckedForm<RunFields>({ resolver: zodResolver(runFieldsSchema), defaultValues });
  const [engineFields, setEngineFields] = useState<FieldMessages>({});
  const messages = mergeMessages(serverFields, flattenErrors(errors), engineFields);

  const submit = handleSubmit(
    async (v) => {
      setFailure(undefined);
      setServerFields({});
      setSaved(false);
      try {
        await onSave(v);
        reset(v);
        setSaved(true);
      } catch (error) {
        setServerFields(isApiError(error) ? error.fields : {});
        setFailure(messageOf(error));
      }
    },
    () => setFailure('Some inputs need attention: see the messages under the fields.'),
  );

  const form = (
    <View style={styles.form}>
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
          render={({ field: { value, onChange } }) => (
            <TubeFields value={value} onChange={onChange} units={units} errors={messages} disabled={!editable} />
          )}
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
      <Section title="Supports along the run" intro="Where the pipe is carried between its ends; the job page checks them against the joints and the engine flange.">
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
      {editable ? (
        <View style={styles.save}>
          {failure ? <ErrorBanner title="The run was not saved" message={`${failure} Your edits are still here.`} /> : null}
          {saved && !isDirty ? (
            <View accessible accessibilityRole="alert" aria-live="polite">
              <Text tone="success" variant="bodyStrong">
                Saved. The server worked the results out again from the published data.
              </Text>
            </View>
          ) : isDirty ? (
            <Text tone="warning">Unsaved changes</Text>
          ) : null}
          <Button label={saveLabel} loading={isSubmitting} onPress={() => void submit()} />
        </View>
      ) : null}
    </View>
  );

  return (
    <View style={wide ? styles.columns : styles.stack}>
      <Card style={wide ? styles.formColumn : undefined}>{form}</Card>
      <View style={wide ? [styles.resultsColumn, stickyOnWeb] : undefined}>
        <LiveRunResults control={control} units={units} onEngineFields={setEngineFields} />
      </View>
    </View>
  );
}

/**
 * On a desktop the results stay in view beside the field being edited: the column sticks to the
 * top of the page's scroller and scrolls on its own when taller than the window. React Native's
 * types know no `sticky` or `vh`, which only the web has.
 */
const stickyOnWeb = Platform.select<ViewStyle>({
  web: { position: 'sticky', top: spacing.md, maxHeight: `calc(100vh - ${2 * spacing.md}px)`, overflowY: 'auto' } as unknown as ViewStyle,
  default: {},
});
/** The joint's fields, which alone need the run's peak and tube size: they watch just those. */
function JointController({ control, units, messages, disabled }: { control: Control<RunFields>; units: UnitSystem; messages: FieldMessages; disabled: boolean }) {
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

const styles = StyleSheet.create({
  stack: { gap: spacing.xxl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  formColumn: { flex: 1, minWidth: 0 },
  resultsColumn: { flex: 1, minWidth: 0 },
  form: { gap: spacing.xl },
  save: { gap: spacing.md },
});
