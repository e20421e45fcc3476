import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { reviewNoteSchema, type AlloyReviewState, type ReviewNote } from '../../shared/schemas/alloy';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { formatWhen } from './format';

function useNoteForm(required: boolean, onSubmit: (note: string) => Promise<unknown>) {
  const [failure, setFailure] = useState<string>();
  const form = useForm<ReviewNote>({ resolver: zodResolver(reviewNoteSchema(required)), mode: 'onTouched', defaultValues: { note: '' } });
  const submit = form.handleSubmit(async ({ note }) => {
    setFailure(undefined);
    try {
      await onSubmit(note);
      form.reset({ note: '' });
    } catch (error) {
      setFailure(messageOf(error));
    }
  });
  return { form, submit, failure };
}

function NoteField({ form, label, hint }: { form: ReturnType<typeof useNoteForm>['form']; label: string; hint: string }) {
  return (
    <Controller
      control={form.control}
      name="note"
      render={({ field: { onChange, onBlur, value, ref } }) => (
        <TextField ref={ref} label={label} value={value} onChangeText={onChange} onBlur={onBlur} error={form.formState.errors.note?.message} hint={hint} multiline numberOfLines={3} maxLength={500} />
      )}
    />
  );
}

/** The admin's "send back", with the note the engineer needs. */
export function SendBackForm({ onSendBack }: { onSendBack: (note: string) => Promise<unknown> }) {
  const { form, submit, failure } = useNoteForm(true, onSendBack);
  return (
    <View style={styles.form}>
      <NoteField form={form} label="What to change" hint="The engineer reads this on the alloy's page." />
      {failure ? <ErrorBanner title="The draft was not sent back" message={failure} /> : null}
      <Button label="Send back to the engineer" variant="secondary" compact loading={form.formState.isSubmitting} onPress={() => void submit()} />
    </View>
  );
}

/** The editor's "submit for review", with an optional note for the admin; and where the draft stands. */
export function SubmitForReview({ review, onSubmit }: { review: AlloyReviewState | null; onSubmit: (note: string) => Promise<unknown> }) {
  const { form, submit, failure } = useNoteForm(false, onSubmit);
  if (review?.step === 'submitted') {
    return (
      <Text variant="bodyStrong" tone="success">
        Submitted for review {formatWhen(review.at)}
        {review.by ? ` by ${review.by}` : ''}: an admin will publish it or send it back.
      </Text>
    );
  }
  return (
    <View style={styles.form}>
      {review?.step === 'sent_back' ? (
        <View accessibilityRole="alert" style={styles.form}>
          <Text variant="bodyStrong" tone="warning">
            Sent back {formatWhen(review.at)}
            {review.by ? ` by ${review.by}` : ''}:
          </Text>
          <Text>“{review.note}”</Text>
        </View>
      ) : null}
      <NoteField form={form} label="Note for the reviewer (optional)" hint="What changed and where it comes from." />
      {failure ? <ErrorBanner title="The draft was not submitted" message={failure} /> : null}
      <Button label="Submit for review" compact loading={form.formState.isSubmitting} onPress={() => void submit()} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.sm },
});
