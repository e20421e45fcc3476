import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { Text } from '../ui/text';

export interface HtmlFrameProps {
  html: string;
  /** Names the frame for screen readers. */
  title: string;
}

/** Off the web there is no sandboxed frame: the HTML is shown as its source text, never run. */
export function HtmlFrame({ html, title }: HtmlFrameProps) {
  return (
    <View accessibilityLabel={title} style={styles.box}>
      <Text variant="caption" selectable>
        {html}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { padding: spacing.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surfaceSunken },
});
