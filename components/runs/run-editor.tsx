import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Platform, StyleSheet, useWindowDimensions, View, type ViewStyle } from 'react-native';
import { layout, spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { runFieldsSchema, type RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { flattenErrors, mergeMessages, type FieldMessages } from './field-errors';
import { LiveRunResults } from './live-run-results';
import { RunFormFields } from './run-form-fields';
import { useStableValue } from './use-live-result';
import { useCheckedForm } from '../forms/use-checked-form';

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

  // The same object while the messages read the same, so the fields below do not render again on a keystroke.
  const stableMessages = useStableValue(messages, JSON.stringify(messages));

  const form = (
    <View style={styles.form}>
      <RunFormFields control={control} units={units} alloyLabel={alloyLabel} messages={stableMessages} editable={editable} />
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
const styles = StyleSheet.create({
  stack: { gap: spacing.xxl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  formColumn: { flex: 1, minWidth: 0 },
  resultsColumn: { flex: 1, minWidth: 0 },
  form: { gap: spacing.xl },
  save: { gap: spacing.md },
});
