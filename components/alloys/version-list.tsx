import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, spacing, touchTarget } from '../../constants/theme';
import type { AlloyVersionSummary } from '../../shared/schemas/alloy';
import { Text } from '../ui/text';
import { formatWhen } from './format';

const STATE_LABELS: Record<AlloyVersionSummary['state'], string> = { published: 'Published', superseded: 'Superseded', draft: 'Draft' };

/** The versions as a list to choose from, newest first. */
export function VersionList({ versions, chosen, onChoose }: { versions: AlloyVersionSummary[]; chosen: number | undefined; onChoose: (version: number) => void }) {
  return (
    <View role="list" aria-label="Versions" style={styles.list}>
      {versions.map((v) => {
        const selected = v.version === chosen;
        const when = v.publishedAt ? `published ${formatWhen(v.publishedAt)}` : `started ${formatWhen(v.createdAt)}`;
        return (
          <View role="listitem" key={v.version}>
            <Pressable
              accessibilityRole="button"
              accessibilityLabel={`Version ${v.version}, ${STATE_LABELS[v.state].toLowerCase()}`}
              aria-pressed={selected}
              onPress={() => onChoose(v.version)}
              style={[styles.row, selected && styles.selected]}
            >
              <Text variant="bodyStrong">
                Version {v.version} · {STATE_LABELS[v.state]}
              </Text>
              <Text variant="caption" tone="muted">
                {when}
              </Text>
            </Pressable>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
  row: { minHeight: touchTarget, justifyContent: 'center', paddingHorizontal: spacing.md, paddingVertical: spacing.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  selected: { borderColor: colors.primary, borderWidth: 2, backgroundColor: colors.surfaceSunken },
});
