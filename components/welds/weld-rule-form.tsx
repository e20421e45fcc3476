import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { spacing } from '../../constants/theme';
import { weldRuleFormSchema, type WeldRuleInput, type WeldRuleView } from '../../shared/schemas/weld-rules';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { placeServerErrors } from '../ui/server-errors';
import { TextField } from '../ui/text-field';

type FormInput = z.input<typeof weldRuleFormSchema>;
type FormValues = z.output<typeof weldRuleFormSchema>;

const FIELDS: { name: keyof FormInput; label: string; hint?: string; multiline?: boolean }[] = [
  { name: 'sideA', label: 'First base metals (UNS)', hint: 'One or more UNS numbers, separated by commas, e.g. S32100, S34700' },
  { name: 'sideB', label: 'Welded to (UNS)', hint: 'The rule holds either way round' },
  { name: 'filler', label: 'Filler (AWS classification)', hint: 'e.g. ER347' },
  { name: 'fillerSpec', label: 'Filler specification', hint: 'e.g. AWS A5.9' },
  { name: 'purge', label: 'Purge and shielding', multiline: true },
  { name: 'notes', label: 'Notes', multiline: true },
  { name: 'procedureRef', label: 'Shop procedure (WPS) reference', hint: 'Empty until the shop has a qualified procedure for the pair' },
  { name: 'source', label: 'Source', hint: 'A named standard or guide, or "common practice, no published source"' },
  { name: 'note', label: 'Why the change (kept in the history)' },
];

const blank: FormInput = { sideA: '', sideB: '', filler: '', fillerSpec: '', purge: '', notes: '', procedureRef: '', source: '', note: '' };

export function formValuesOf(rule: WeldRuleView): FormInput {
  return { ...rule, sideA: rule.sideA.join(', '), sideB: rule.sideB.join(', '), note: '' };
}

export interface WeldRuleFormProps {
  rule?: WeldRuleView;
  saveLabel: string;
  onSubmit: (values: WeldRuleInput & { note: string }) => Promise<unknown>;
  onCancel?: () => void;
}

/** Adds or edits one row of the weld table. */
export function WeldRuleForm({ rule, saveLabel, onSubmit, onCancel }: WeldRuleFormProps) {
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, reset, setError, formState } = useForm<FormInput, unknown, FormValues>({
    resolver: zodResolver(weldRuleFormSchema),
    defaultValues: rule ? formValuesOf(rule) : blank,
  });
  const submit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await onSubmit(values);
      if (!rule) reset(blank);
    } catch (e) {
      setFailure(placeServerErrors(e, setError));
    }
  });
  return (
    <View style={styles.form}>
      {FIELDS.filter((f) => rule || f.name !== 'note').map((f) => (
        <Controller
          key={f.name}
          control={control}
          name={f.name}
          render={({ field, fieldState }) => (
            <TextField
              ref={field.ref}
              label={f.label}
              value={String(field.value ?? '')}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              multiline={f.multiline}
              autoCapitalize={f.name === 'sideA' || f.name === 'sideB' ? 'characters' : 'sentences'}
              error={fieldState.error?.message}
              hint={f.hint}
            />
          )}
        />
      ))}
      {failure ? <ErrorBanner title="The rule was not saved" message={failure} /> : null}
      <View style={styles.actions}>
        <Button label={saveLabel} onPress={() => void submit()} loading={formState.isSubmitting} />
        {onCancel ? <Button label="Cancel" variant="secondary" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
