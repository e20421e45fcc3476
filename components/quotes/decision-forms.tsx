import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { acceptQuoteSchema, declineQuoteSchema } from '../../shared/schemas/quotes';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

type Submit<T> = (values: T) => Promise<unknown>;

function failureText(error: unknown): string {
  return isApiError(error) && error.code === 'already_decided' ? `${error.message} Nothing more is needed from you.` : messageOf(error);
}

/** Sends the answer; a refusal is shown in words and the form keeps what was typed. */
function recording<T>(onSubmit: Submit<T>, setFailure: (text: string | undefined) => void) {
  return async (values: T) => {
    setFailure(undefined);
    try {
      await onSubmit(values);
    } catch (error) {
      setFailure(failureText(error));
    }
  };
}

/** Asks who is accepting, then accepts the one option. */
export function AcceptForm({ optionIndex, optionLabel, onSubmit, onCancel }: { optionIndex: number; optionLabel: string; onSubmit: Submit<z.output<typeof acceptQuoteSchema>>; onCancel: () => void }) {
  const [failure, setFailure] = useState<string>();
  const {
    control,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useCheckedForm<z.input<typeof acceptQuoteSchema>, unknown, z.output<typeof acceptQuoteSchema>>({
    resolver: zodResolver(acceptQuoteSchema),
    defaultValues: { optionIndex, name: '' },
  });
  const submit = handleSubmit(recording(onSubmit, setFailure));
  const label = `Accept option ${optionIndex + 1}`;
  return (
    <View style={styles.form}>
      <Text variant="bodyStrong">
        You are accepting option {optionIndex + 1}, {optionLabel}.
      </Text>
      <Controller
        control={control}
        name="name"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField ref={ref} label="Your name" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.name?.message} autoCapitalize="words" autoComplete="name" />
        )}
      />
      {failure ? <ErrorBanner title="Your answer was not recorded" message={failure} /> : null}
      <View style={styles.buttons}>
        <Button label={isSubmitting ? 'Sending…' : `Confirm: ${label.toLowerCase()}`} accessibilityLabel={`Confirm: ${label.toLowerCase()}`} loading={isSubmitting} onPress={() => void submit()} />
        <Button label="Back" variant="ghost" disabled={isSubmitting} onPress={onCancel} />
      </View>
    </View>
  );
}

/** Declines the whole quote; the reason is optional and goes to the shop. */
export function DeclineForm({ onSubmit, onCancel }: { onSubmit: Submit<z.output<typeof declineQuoteSchema>>; onCancel: () => void }) {
  const [failure, setFailure] = useState<string>();
  const {
    control,
    handleSubmit,
    formState: { errors, isSubmitting },
  } = useCheckedForm<z.input<typeof declineQuoteSchema>, unknown, z.output<typeof declineQuoteSchema>>({
    resolver: zodResolver(declineQuoteSchema),
    defaultValues: { name: '', reason: '' },
  });
  const submit = handleSubmit(recording(onSubmit, setFailure));
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="name"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField ref={ref} label="Your name" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.name?.message} autoCapitalize="words" autoComplete="name" />
        )}
      />
      <Controller
        control={control}
        name="reason"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField ref={ref} label="Reason (optional)" value={value ?? ''} onChangeText={onChange} onBlur={onBlur} error={errors.reason?.message} multiline numberOfLines={3} />
        )}
      />
      {failure ? <ErrorBanner title="Your answer was not recorded" message={failure} /> : null}
      <View style={styles.buttons}>
        <Button label={isSubmitting ? 'Sending…' : 'Confirm: decline the quote'} accessibilityLabel="Confirm: decline the quote" variant="danger" loading={isSubmitting} onPress={() => void submit()} />
        <Button label="Back" variant="ghost" disabled={isSubmitting} onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md, alignSelf: 'stretch' },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
