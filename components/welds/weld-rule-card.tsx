import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useDeleteWeldRuleMutation, useUpdateWeldRuleMutation, useWeldRuleRevisionsQuery } from '../../hooks/use-weld-rules';
import type { WeldRuleView } from '../../shared/schemas/weld-rules';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { WeldRuleForm } from './weld-rule-form';

const shown = (v: unknown) => (Array.isArray(v) ? v.join(', ') : v === null || v === '' ? '(empty)' : typeof v === 'object' ? 'the whole rule' : String(v));

function History({ ruleId }: { ruleId: string }) {
  const revisions = useWeldRuleRevisionsQuery(ruleId);
  if (revisions.isPending) return <Text tone="muted">Loading the history…</Text>;
  if (revisions.isError) return <ErrorBanner title="The history did not load" message={messageOf(revisions.error)} />;
  return (
    <View role="list" aria-label="Rule history" style={styles.list}>
      {revisions.data.map((r) => (
        <View role="listitem" key={r.id}>
          <Text variant="caption">
            Version {r.version}, {r.action} {r.userName ? `by ${r.userName} ` : ''}on {r.at.slice(0, 10)}
            {r.note ? `: ${r.note}` : ''}
          </Text>
          {r.action === 'edited'
            ? r.diff.map((d) => (
                <Text key={d.path} variant="caption" tone="muted">
                  {d.path}: {shown(d.before)} → {shown(d.after)}
                </Text>
              ))
            : null}
        </View>
      ))}
    </View>
  );
}

/** One rule of the weld table, with edit, delete and history for those who keep the table. */
export function WeldRuleCard({ rule, canEdit }: { rule: WeldRuleView; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  const [history, setHistory] = useState(false);
  const update = useUpdateWeldRuleMutation(rule.id);
  const remove = useDeleteWeldRuleMutation();
  const title = `${rule.filler}: ${rule.sideA.join(', ')} to ${rule.sideB.join(', ')}`;
  return (
    <Card role="article" aria-label={title}>
      <View style={styles.body}>
        <Text variant="bodyStrong">
          {rule.filler} ({rule.fillerSpec})
        </Text>
        <Text>
          {rule.sideA.join(', ')} to {rule.sideB.join(', ')}
        </Text>
        <Text variant="caption">Purge and shielding: {rule.purge}</Text>
        {rule.notes ? <Text variant="caption">{rule.notes}</Text> : null}
        <Text variant="caption">Shop procedure: {rule.procedureRef || 'none recorded'}</Text>
        <Text variant="caption" tone="muted">
          Source: {rule.source}. Version {rule.version}
          {rule.updatedBy ? `, last changed by ${rule.updatedBy}` : ''}.
        </Text>
        <View style={styles.actions}>
          {canEdit && !editing ? <Button label="Edit" accessibilityLabel={`Edit the rule ${title}`} compact variant="secondary" onPress={() => setEditing(true)} /> : null}
          <Button label={history ? 'Hide history' : 'History'} accessibilityLabel={`${history ? 'Hide the history' : 'History'} of the rule ${title}`} compact variant="secondary" onPress={() => setHistory((h) => !h)} />
          {canEdit ? (
            <Button label="Delete" accessibilityLabel={`Delete the rule ${title}`} compact variant="secondary" loading={remove.isPending} onPress={() => remove.mutate(rule.id)} />
          ) : null}
        </View>
        {remove.isError ? <ErrorBanner title="The rule was not deleted" message={messageOf(remove.error)} /> : null}
        {editing ? (
          <WeldRuleForm
            rule={rule}
            saveLabel="Save rule"
            onCancel={() => setEditing(false)}
            onSubmit={async (values) => {
              await update.mutateAsync(values);
              setEditing(false);
            }}
          />
        ) : null}
        {history ? <History ruleId={rule.id} /> : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  list: { gap: spacing.xs },
});
