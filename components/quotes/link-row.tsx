import type { Href } from 'expo-router';
import { Link } from 'expo-router';
import { type ReactNode, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget } from '../../constants/theme';

/** A whole card that is one link. */
export function LinkRow({ href, label, children }: { href: Href; label: string; children: ReactNode }) {
  // Link's asChild hands the child's style straight to the DOM: a plain object, no callback.
  const [hovered, setHovered] = useState(false);
  const [focused, setFocused] = useState(false);
  return (
    <Link href={href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={label}
        onHoverIn={() => setHovered(true)}
        onHoverOut={() => setHovered(false)}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        style={StyleSheet.flatten([styles.row, hovered && styles.hovered, focused && styles.focused])}
      >
        {children}
      </Pressable>
    </Link>
  );
}

export interface LinkListProps<T> {
  items: T[];
  keyOf: (item: T) => string;
  hrefOf: (item: T) => Href;
  labelOf: (item: T) => string;
  render: (item: T) => ReactNode;
}

/** A list whose every item is a LinkRow. */
export function LinkList<T>({ items, keyOf, hrefOf, labelOf, render }: LinkListProps<T>) {
  return (
    <View role="list" style={styles.list}>
      {items.map((item) => (
        <View key={keyOf(item)} role="listitem">
          <LinkRow href={hrefOf(item)} label={labelOf(item)}>
            {render(item)}
          </LinkRow>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  row: { minHeight: touchTarget, gap: spacing.xxs, padding: spacing.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceRaised },
  hovered: { borderColor: colors.primary },
  focused: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 },
});
