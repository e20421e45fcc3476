import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import type { AlloyStatusAction } from '../../hooks/use-alloys';
import type { AlloyStatus } from '../../shared/schemas/alloy';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { SuccessNote } from './success-note';

export interface StatusActionsProps {
  status: AlloyStatus;
  hasDraft: boolean;
  hasPublished: boolean;
  onAction: (action: AlloyStatusAction, note: string) => Promise<unknown>;
  /** Only the actions wanted here, e.g. just publishing on the review screen. */
  only?: AlloyStatusAction[];
  /** What publishing will do, asked once more before it happens ("Publish draft version 3 of Type 347?"). */
  publishQuestion?: string;
}

const DONE: Record<AlloyStatusAction, string> = {
  publish: 'Published. Everyone now works from this version.',
  retire: 'Retired. Readers no longer see it in the list.',
  restore: 'Restored to the published list.',
};

/** The admin's publish, retire and restore, each recorded in the history with a note. */
export function StatusActions({ status, hasDraft, hasPublished, onAction, only, publishQuestion = 'Publish the draft?' }: StatusActionsProps) {
  const [note, setNote] = useState('');
  const [noteError, setNoteError] = useState<string>();
  const [confirming, setConfirming] = useState(false);
  const [pending, setPending] = useState<AlloyStatusAction | null>(null);
  const [failure, setFailure] = useState<string>();
  const [done, setDone] = useState<string>();
  const wanted = (a: AlloyStatusAction) => !only || only.includes(a);

  /** Publishing needs a note and a second yes: everyone works from the published data at once. */
  function ask(action: AlloyStatusAction) {
    if (action !== 'publish') return void run(action);
    if (note.trim() === '') {
      setNoteError('Write a note for the history: what changed and why.');
      return;
    }
    setNoteError(undefined);
    setConfirming(true);
  }

  async function run(action: AlloyStatusAction) {
    setConfirming(false);
    setPending(action);
    setFailure(undefined);
    setDone(undefined);
    try {
      await onAction(action, note.trim());
      setNote('');
      setDone(DONE[action]);
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setPending(null);
    }
  }

  const actions: { action: AlloyStatusAction; label: string; show: boolean; variant: 'primary' | 'danger' | 'secondary' }[] = [
    { action: 'publish', label: 'Publish', show: hasDraft, variant: 'primary' },
    { action: 'retire', label: 'Retire', show: hasPublished && status === 'published', variant: 'danger' },
    { action: 'restore', label: 'Restore', show: status === 'retired', variant: 'secondary' },
  ];
  const shown = actions.filter((a) => a.show && wanted(a.action));

  return (
    <View style={styles.wrapper}>
      {shown.length === 0 && !done ? <Text tone="muted">Nothing to publish, retire or restore.</Text> : null}
      {shown.length > 0 ? (
        <>
          <TextField
            label="Note for the history"
            value={note}
            onChangeText={(text) => {
              setNote(text);
              if (text.trim()) setNoteError(undefined);
            }}
            maxLength={500}
            hint={hasDraft && wanted('publish') ? 'Why, in a sentence; needed to publish.' : 'Why, in a sentence.'}
            error={noteError}
          />
          {confirming ? (
            <View role="alertdialog" aria-label="Confirm publishing" style={styles.confirm}>
              <Text variant="bodyStrong">{publishQuestion}</Text>
              <Text tone="muted">Quotes, jobs and the calculator use it from now on; the version before stays readable in the history.</Text>
              <View style={styles.buttons}>
                <Button label="Yes, publish" compact onPress={() => void run('publish')} />
                <Button label="Cancel" variant="ghost" compact onPress={() => setConfirming(false)} />
              </View>
            </View>
          ) : (
            <View style={styles.buttons}>
              {shown.map((a) => (
                <Button
                  key={a.action}
                  label={a.label}
                  variant={a.variant}
                  compact
                  loading={pending === a.action}
                  disabled={pending !== null}
                  onPress={() => ask(a.action)}
                />
              ))}
            </View>
          )}
        </>
      ) : null}
      {failure ? <ErrorBanner message={failure} /> : null}
      {done ? <SuccessNote message={done} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  confirm: { gap: spacing.sm, padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.warning, backgroundColor: colors.warningSoft },
});
