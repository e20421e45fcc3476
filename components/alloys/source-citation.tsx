import { Linking, StyleSheet, View } from 'react-native';
import { colors, spacing, typography } from '../../constants/theme';
import { SOURCE_KIND_LABELS, type SourceView } from '../../shared/schemas/alloy';
import { Text } from '../ui/text';
import { Tag } from '../ui/tag';

export type SourceIndex = Map<string, { n: number; source: SourceView }>;

/** Numbers the sources in the order a version first cites them, so each value can say "[2]". */
export function indexSources(order: string[], sources: SourceView[]): SourceIndex {
  const byId = new Map(sources.map((s) => [s.id, s]));
  const index: SourceIndex = new Map();
  for (const id of order) {
    const source = byId.get(id);
    if (source && !index.has(id)) index.set(id, { n: index.size + 1, source });
  }
  return index;
}

/** The short citation beside a value: its number, the source's title, and a flag when it is from memory. */
export function Cite({ sourceId, index }: { sourceId: string; index: SourceIndex }) {
  const entry = index.get(sourceId);
  if (!entry) return <Text variant="caption" tone="danger">No source on record</Text>;
  const memory = entry.source.kind === 'memory';
  return (
    <View style={styles.cite}>
      <Text variant="caption" tone="muted">
        [{entry.n}] {entry.source.title}
      </Text>
      {memory ? <Tag label="To be verified" tone="warning" /> : null}
    </View>
  );
}

/** The full record of every source a version cites: title, issuer, edition, link. */
export function SourceList({ index }: { index: SourceIndex }) {
  return (
    <View role="list" aria-label="Sources" style={styles.list}>
      {[...index.values()].map(({ n, source }) => (
        <View key={source.id} role="listitem" style={[styles.item, source.kind === 'memory' && styles.memory]}>
          <Text variant="bodyStrong">
            [{n}] {source.title}
          </Text>
          <Text variant="caption" tone="muted">
            {[SOURCE_KIND_LABELS[source.kind], source.issuer, source.edition].filter(Boolean).join(' · ')}
          </Text>
          {source.kind === 'memory' ? (
            <Text variant="caption" tone="warning">
              From memory — to be verified against a published source before anyone relies on it.
            </Text>
          ) : null}
          {source.note ? <Text variant="caption">{source.note}</Text> : null}
          {source.url ? (
            <Text
              accessibilityRole="link"
              style={styles.link}
              onPress={() => void Linking.openURL(source.url!)}
              numberOfLines={1}
            >
              {source.url}
            </Text>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  cite: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xs },
  list: { gap: spacing.md },
  item: { gap: spacing.xxs, paddingLeft: spacing.md, borderLeftWidth: 3, borderLeftColor: colors.border },
  memory: { borderLeftColor: colors.warning, backgroundColor: colors.warningSoft, paddingVertical: spacing.xs },
  link: { ...typography.caption, color: colors.primary, textDecorationLine: 'underline', paddingVertical: spacing.xs },
});
