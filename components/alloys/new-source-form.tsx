import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { SOURCE_KIND_LABELS, SOURCE_KINDS, sourceInputSchema, type SourceInput, type SourceView } from '../../shared/schemas/alloy';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { SegmentedControl } from '../ui/segmented-control';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

const KIND_OPTIONS = SOURCE_KINDS.map((k) => ({ value: k, label: SOURCE_KIND_LABELS[k] }));
const FIELDS = ['kind', 'title', 'issuer', 'edition', 'url', 'note'] as const;

export interface NewSourceFormProps {
  onCreate: (input: SourceInput) => Promise<SourceView>;
  onCreated: (source: SourceView) => void;
  onCancel: () => void;
}

type SourceDraft = { kind: SourceInput['kind']; title: string; issuer?: string | null; edition?: string | null; url?: string | null; note?: string | null };

export function NewSourceForm({ onCreate, onCreated, onCancel }: NewSourceFormProps) {
  const [failure, setFailure] = useState<string>();
  const { control, handleSubmit, setError, formState: { errors, isSubmitting } } = useCheckedForm<SourceDraft, unknown, SourceInput>({
    resolver: zodResolver(sourceInputSchema),
    defaultValues: { kind: 'datasheet', title: '', issuer: '', edition: '', url: null, note: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    try {
      onCreated(await onCreate(values));
    } catch (error) {
      const fields = isApiError(error) ? error.fields : {};
      const placed = FIELDS.filter((f) => fields[f]);
      placed.forEach((f) => setError(f, { type: 'server', message: fields[f] }));
      if (placed.length === 0) setFailure(messageOf(error));
    }
  });

  const text = (name: 'title' | 'issuer' | 'edition' | 'note', label: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <TextField ref={field.ref} label={label} value={field.value ?? ''} onChangeText={field.onChange} onBlur={field.onBlur} error={errors[name]?.message} />
      )}
    />
  );

  return (
    <View style={styles.form}>
      {failure ? <ErrorBanner title="The source was not added" message={failure} /> : null}
      <Controller
        control={control}
        name="kind"
        render={({ field }) => (
          <SegmentedControl label="Kind of source" options={KIND_OPTIONS} value={field.value} onChange={field.onChange} error={errors.kind?.message} />
        )}
      />
      {text('title', 'Source title')}
      {text('issuer', 'Issuer')}
      {text('edition', 'Edition or year')}
      <Controller
        control={control}
        name="url"
        render={({ field }) => (
          <TextField
            ref={field.ref}
            label="Link (optional)"
            value={field.value ?? ''}
            onChangeText={(t) => field.onChange(t.trim() === '' ? null : t)}
            onBlur={field.onBlur}
            error={errors.url?.message}
            autoCapitalize="none"
            inputMode="url"
          />
        )}
      />
      <View style={styles.actions}>
        <Button label="Add source" compact loading={isSubmitting} onPress={() => void submit()} />
        <Button label="Cancel" accessibilityLabel="Cancel the new source" variant="ghost" compact onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
