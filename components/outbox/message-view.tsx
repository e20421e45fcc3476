import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { SegmentedControl } from '../ui/segmented-control';
import { Text } from '../ui/text';
import { HtmlFrame } from './html-frame';

export interface MessageViewProps {
  subject: string;
  to: string;
  text: string;
  html: string;
  /** Who sent it and when, if known. */
  meta?: string;
  /** Off when the screen already shows the subject as its heading. */
  showSubject?: boolean;
}

type Part = 'text' | 'html';
const PARTS = [
  { value: 'text', label: 'Text' },
  { value: 'html', label: 'HTML' },
] as const;

/** An e-mail's headers, its plain text, and its HTML drawn in a sandbox where nothing runs. */
export function MessageView({ subject, to, text, html, meta, showSubject = true }: MessageViewProps) {
  const [part, setPart] = useState<Part>('text');
  return (
    <View style={styles.wrapper}>
      <View style={styles.headers}>
        <Text variant="caption" tone="muted">
          To: {to}
        </Text>
        {meta ? (
          <Text variant="caption" tone="muted">
            {meta}
          </Text>
        ) : null}
        {showSubject ? <Text variant="bodyStrong">Subject: {subject}</Text> : null}
      </View>
      <SegmentedControl label="Show the message as" options={PARTS} value={part} onChange={setPart} />
      {part === 'text' ? (
        <View aria-label="Message text" style={styles.text}>
          <Text selectable>{text}</Text>
        </View>
      ) : (
        <HtmlFrame html={html} title={`HTML of “${subject}”`} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.md },
  headers: { gap: spacing.xxs },
  text: { padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceRaised },
});
