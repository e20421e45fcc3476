import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Text } from './text';

/** A titled part of a long page, so that headings give screen-reader users a map. */
export function Section({ title, children, intro }: { title: string; intro?: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text variant="heading" headingLevel={2}>
        {title}
      </Text>
      {intro ? <Text tone="muted">{intro}</Text> : null}
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: spacing.md },
});
