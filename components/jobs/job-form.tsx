import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import type { z } from 'zod';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { jobCreateSchema, type JobCreateInput } from '../../shared/schemas/jobs';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

const FIELDS = [
  { name: 'name', label: 'Job name', hint: undefined },
  { name: 'customer', label: 'Customer', hint: undefined },
  { name: 'application', label: 'Application', hint: 'What the system is for, e.g. turbo exhaust for a 2.0 L four' },
  { name: 'notes', label: 'Notes', hint: undefined },
] as const;

export interface JobFormProps {
  defaultValues?: JobCreateInput;
  submitLabel: string;
  /** Saves; a rejection keeps everything typed and shows the server's messages. */
  onSubmit: (values: JobCreateInput) => Promise<unknown>;
  onCancel?: () => void;
}

const EMPTY: JobCreateInput = { name: '', customer: '', application: '', notes: '' };

export function JobForm({ defaultValues = EMPTY, submitLabel, onSubmit, onCancel }: JobFormProps) {
  const [failure, setFailure] = useState<string>();
  const {
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useCheckedForm<z.input<typeof jobCreateSchema>, unknown, JobCreateInput>({ resolver: zodResolver(jobCreateSchema), defaultValues });

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    try {
      await onSubmit(values);
    } catch (error) {
      const fields = isApiError(error) ? error.fields : {};
      let placed = false;
      for (const f of FIELDS) {
        if (fields[f.name]) {
          setError(f.name, { type: 'server', message: fields[f.name] });
          placed = true;
        }
      }
      if (!placed) setFailure(messageOf(error));
    }
  });

  return (
    <View style={styles.form}>
      {failure ? <ErrorBanner title="The job was not saved" message={failure} /> : null}
      {FIELDS.map((f) => (
        <Controller
          key={f.name}
          control={control}
          name={f.name}
          render={({ field: { onChange, onBlur, value, ref } }) => (
            <TextField
              ref={ref}
              label={f.label}
              value={value}
              onChangeText={onChange}
              onBlur={onBlur}
              error={errors[f.name]?.message}
              hint={f.hint}
              multiline={f.name === 'notes'}
            />
          )}
        />
      ))}
      <View style={styles.actions}>
        <Button label={submitLabel} loading={isSubmitting} onPress={() => void submit()} />
        {onCancel ? <Button label="Cancel" variant="ghost" onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
