import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

/** A plain page for a link that does not (or no longer) open a quote: no codes, no app links. */
export function PublicNotice({ title, message, onRetry }: { title: string; message: string; onRetry?: () => void }) {
  return (
    <View style={styles.notice}>
      <Text variant="title" headingLevel={1}>
        {title}
      </Text>
      <Text>{message}</Text>
      {onRetry ? <Button label="Try again" variant="secondary" onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  notice: { gap: spacing.md, alignItems: 'flex-start' },
});
