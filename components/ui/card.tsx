import type { ReactNode } from 'react';
import { StyleSheet, View, type ViewProps } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';

export interface CardProps extends ViewProps {
  children: ReactNode;
  /** A coloured edge on the left, used sparingly to mark state. */
  edge?: 'accent' | 'primary' | 'muted';
}

export function Card({ children, edge, style, ...rest }: CardProps) {
  return (
    <View style={[styles.card, edge && styles.edged, edge && edgeStyles[edge], style]} {...rest}>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surfaceRaised,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  edged: { borderLeftWidth: 6 },
});

const edgeStyles = StyleSheet.create({
  accent: { borderLeftColor: colors.accent },
  primary: { borderLeftColor: colors.primary },
  muted: { borderLeftColor: colors.borderStrong },
});
