import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { WELD_KIND_LABELS } from '../../shared/welds/weld-sites';
import type { WeldView } from '../../shared/welds/weld-plan';
import { Text } from '../ui/text';

/** One weld: where, what it joins, and the filler and purge the shop's table gives, or why there is none. */
export function WeldRow({ weld }: { weld: WeldView }) {
  const open = weld.status !== 'rule';
  return (
    <View style={[styles.row, open && styles.open]} role="listitem" aria-label={`${weld.number}: ${weld.where}`}>
      <Text variant="bodyStrong">
        {weld.number} · {weld.where} ({WELD_KIND_LABELS[weld.kind].toLowerCase()})
      </Text>
      <Text>{weld.pair}</Text>
      {weld.filler ? (
        <>
          <Text>
            Filler <Text variant="bodyStrong">{weld.filler}</Text> ({weld.fillerSpec})
            {weld.procedureRef ? `, shop procedure ${weld.procedureRef}` : ''}
          </Text>
          <Text variant="caption">Purge and shielding: {weld.purge}</Text>
          {weld.notes ? <Text variant="caption">{weld.notes}</Text> : null}
          <Text variant="caption" tone="muted">
            Source: {weld.source}
          </Text>
        </>
      ) : (
        <Text tone={weld.status === 'refused' ? 'danger' : 'warning'}>{weld.message}.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.xxs, paddingVertical: spacing.sm, paddingHorizontal: spacing.md, borderLeftWidth: 4, borderLeftColor: colors.border, borderRadius: radii.sm },
  open: { borderLeftColor: colors.warning },
});
