import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useUnits } from '../../hooks/use-units';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';

export interface SendPanelProps {
  number: string;
  customerEmail: string;
  /** Sends the quote; a rejection shows the server's reason and keeps the draft. */
  onSend: () => Promise<unknown>;
  /** Unsaved edits in the builder: sending would send the last saved version. */
  disabledReason?: string;
}

/** "Send quote" asks once more, naming the address, because a sent quote freezes and cannot change. */
export function SendPanel({ number, customerEmail, onSend, disabledReason }: SendPanelProps) {
  const [confirming, setConfirming] = useState(false);
  const [sending, setSending] = useState(false);
  // The refusal itself, so its temperatures follow a unit switch.
  const [failure, setFailure] = useState<unknown>();
  const units = useUnits();

  const send = async () => {
    setSending(true);
    setFailure(undefined);
    try {
      await onSend();
      setConfirming(false);
    } catch (error) {
      setFailure(error);
    } finally {
      setSending(false);
    }
  };

  return (
    <Card edge="accent">
      <Text variant="heading" headingLevel={2}>
        Send to the customer
      </Text>
      <Text tone="muted">
        Sending freezes today’s prices into the quote and e-mails {customerEmail} a private link to compare the options and accept one.
      </Text>
      {disabledReason ? (
        <Text variant="caption" tone="warning">
          {disabledReason}
        </Text>
      ) : null}
      {failure ? <ErrorBanner title="The quote was not sent" message={messageOf(failure, units)} /> : null}
      {confirming ? (
        <View style={styles.confirm} accessibilityRole="alert">
          <Text variant="bodyStrong">
            Send quote {number} to {customerEmail} now? It cannot be changed afterwards.
          </Text>
          <View style={styles.buttons}>
            <Button label={sending ? 'Sending…' : 'Yes, send it'} accessibilityLabel="Yes, send it" loading={sending} onPress={() => void send()} />
            <Button label="Cancel" variant="ghost" disabled={sending} onPress={() => setConfirming(false)} />
          </View>
        </View>
      ) : (
        <Button label="Send quote" disabled={Boolean(disabledReason)} onPress={() => setConfirming(true)} />
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  confirm: { gap: spacing.md },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
