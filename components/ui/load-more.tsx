import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { Button } from './button';
import { Text } from './text';

export interface LoadMoreProps {
  /** What the list holds, plural ("alloys", "jobs"). */
  noun: string;
  shown: number;
  total: number;
  hasMore: boolean;
  loading: boolean;
  onLoadMore: () => void;
}

/** "Showing 50 of 10,000" and a button that loads the next page under the list. */
export function LoadMore({ noun, shown, total, hasMore, loading, onLoadMore }: LoadMoreProps) {
  return (
    <View style={styles.row}>
      <Text tone="muted">
        Showing {shown.toLocaleString('en')} of {total.toLocaleString('en')} {noun}
      </Text>
      {hasMore ? (
        <Button label={`Load more ${noun}`} variant="secondary" compact loading={loading} onPress={onLoadMore} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md },
});
