import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { AlloyDetail, AlloyVersionView } from '../../shared/schemas/alloy';
import { Text } from '../ui/text';
import { familyLabel, formatWhen } from './format';
import { Tag } from '../ui/tag';

/** Designation, UNS, family, and which version the page is showing. */
export function AlloyHeader({ alloy, shown }: { alloy: AlloyDetail; shown: AlloyVersionView }) {
  const published = alloy.published;
  return (
    <View style={styles.header}>
      <Text variant="overline" tone="muted">
        {familyLabel(shown.family)}
      </Text>
      <Text variant="title" headingLevel={1}>
        {shown.designation}
      </Text>
      <Text variant="bodyStrong" selectable>
        UNS {shown.uns}
      </Text>
      <View style={styles.tags}>
        {published ? <Tag label={`Version ${published.version}`} tone="primary" /> : <Tag label="Never published" tone="warning" />}
        {alloy.status === 'retired' ? <Tag label="Retired" tone="danger" /> : null}
        {alloy.draft ? <Tag label={`Draft version ${alloy.draft.version} open`} tone="warning" /> : null}
      </View>
      {published?.publishedAt ? (
        <Text variant="caption" tone="muted">
          Version {published.version} published {formatWhen(published.publishedAt)}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
