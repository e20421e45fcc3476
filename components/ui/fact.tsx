import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Text } from './text';

/** A labelled value, named as a group so that "Density: 7960 kg/m³" reads as one thing. */
export function Fact({ label, value, large = false, children }: { label: string; value: string; large?: boolean; children?: ReactNode }) {
  return (
    <View style={[styles.fact, large && styles.large]} role="group" aria-label={label}>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
      <Text variant={large ? 'heading' : 'bodyStrong'}>{value}</Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  fact: { minWidth: 130, gap: spacing.xxs },
  large: { flexGrow: 1, flexBasis: 220 },
});
