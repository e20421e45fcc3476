import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { WeldRuleCard } from '../welds/weld-rule-card';
import { WeldRuleForm } from '../welds/weld-rule-form';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useSessionQuery } from '../../hooks/use-session';
import { useCreateWeldRuleMutation, useWeldRulesQuery } from '../../hooks/use-weld-rules';
import { WPS_CAUTION } from '../../shared/welds/weld-pairing';
import { useScreenTitle } from '../ui/use-screen-title';

export default function WeldRulesScreen() {
  const { data: me } = useSessionQuery();
  const rules = useWeldRulesQuery();
  const create = useCreateWeldRuleMutation();
  const [search, setSearch] = useState('');
  useScreenTitle('Weld rules');

  if (!me) return <LoadingState />;
  const canEdit = me.role === 'engineer' || me.role === 'admin';
  const wanted = search.trim().toUpperCase();
  const shown = (rules.data ?? []).filter((r) => !wanted || [...r.sideA, ...r.sideB, r.filler.toUpperCase()].some((x) => x.includes(wanted)));
  return (
    <Screen narrow>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Weld rules
        </Text>
        <Text tone="muted">
          The shop&apos;s table of base-metal pairs (by UNS number) and the filler, purge and shielding for each. Every job&apos;s weld plan is paired against it; a pair without a rule says so. Titanium is never paired with another metal.
        </Text>
        <Text variant="caption">{WPS_CAUTION}</Text>
      </View>
      <TextField label="Find a rule" hint="A UNS number or a filler, e.g. S32100 or ER347" value={search} onChangeText={setSearch} autoCapitalize="characters" autoCorrect={false} />
      {rules.isPending ? (
        <LoadingState label="Loading the weld rules…" />
      ) : rules.isError ? (
        <ErrorBanner title="The weld rules did not load" message={messageOf(rules.error)} onRetry={() => void rules.refetch()} />
      ) : (
        <View role="list" aria-label="Weld rules" style={styles.list}>
          {shown.map((r) => (
            <View role="listitem" key={r.id}>
              <WeldRuleCard rule={r} canEdit={canEdit} />
            </View>
          ))}
          {shown.length === 0 ? <Text tone="muted">No rule matches.</Text> : null}
        </View>
      )}
      {canEdit ? (
        <Card>
          <Text variant="heading" headingLevel={2}>
            Add a rule
          </Text>
          <WeldRuleForm saveLabel="Add rule" onSubmit={(values) => create.mutateAsync(values)} />
        </Card>
      ) : (
        <Text tone="muted">Engineers and admins keep the weld rules.</Text>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  list: { gap: spacing.md },
});
