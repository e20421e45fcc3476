import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { colors, layout, spacing } from '../../constants/theme';

export interface ScreenProps {
  children: ReactNode;
  /** Narrow column for forms such as sign-in. */
  narrow?: boolean;
  /** Room for two columns on a desktop. */
  wide?: boolean;
}

/** A scrolling page whose content stops growing on wide screens. */
export function Screen({ children, narrow = false, wide = false }: ScreenProps) {
  return (
    <ScrollView
      style={styles.scroll}
      contentContainerStyle={styles.container}
      keyboardShouldPersistTaps="handled"
    >
      <View style={[styles.column, narrow && styles.narrow, wide && styles.wide]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.background },
  container: { flexGrow: 1, paddingHorizontal: spacing.lg, paddingVertical: spacing.xl },
  column: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center', gap: spacing.xl },
  narrow: { maxWidth: layout.formMaxWidth },
  wide: { maxWidth: layout.wideContentMaxWidth },
});
