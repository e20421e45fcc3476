import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import type { FlexPartInput, FlexPartView } from '../../shared/schemas/alloy';
import { formatQuantity, type UnitSystem } from '../../shared/units';
import { formatTemp } from '../alloys/format';
import { Fact } from '../ui/fact';
import { FLEX_PURPOSE_LABELS } from '../../shared/schemas/alloy';
import { Tag } from '../ui/tag';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { FlexPartForm } from './flex-part-form';

export interface FlexPartCardProps {
  part: FlexPartView;
  units: UnitSystem;
  /** Present for admins. */
  onUpdate?: (changes: Partial<FlexPartInput>) => Promise<unknown>;
}

export function FlexPartCard({ part, units, onUpdate }: FlexPartCardProps) {
  const [editing, setEditing] = useState(false);
  const [pending, setPending] = useState(false);
  const [failure, setFailure] = useState<string>();
  const mm = (v: number) => formatQuantity('length', v, units).text;

  async function setActive(active: boolean) {
    if (!onUpdate) return;
    setPending(true);
    setFailure(undefined);
    try {
      await onUpdate({ active });
    } catch (error) {
      setFailure(messageOf(error));
    } finally {
      setPending(false);
    }
  }

  const { id: _id, isDemo: _demo, ...input } = part;
  return (
    <Card role="article" aria-label={`${part.code} ${part.name}`} edge={part.active ? undefined : 'muted'}>
      <View style={styles.header}>
        <Text variant="heading" headingLevel={3}>
          {part.code}
        </Text>
        <View style={styles.tags}>
          {part.isDemo ? <Tag label="demo" /> : null}
          {part.purpose === 'thermal_bellows' ? null : <Tag label={FLEX_PURPOSE_LABELS[part.purpose]} tone="warning" />}
          {part.active ? null : <Tag label="Inactive" tone="danger" />}
        </View>
      </View>
      <Text>{part.name}</Text>
      {editing && onUpdate ? (
        <FlexPartForm
          defaultValues={input}
          context={part.code}
          submitLabel="Save part"
          onCancel={() => setEditing(false)}
          onSubmit={async (values) => {
            await onUpdate(values);
            setEditing(false);
          }}
        />
      ) : (
        <View style={styles.facts}>
          <Fact label="Bore" value={mm(part.boreMm)} />
          <Fact label="Live length" value={mm(part.liveLengthMm)} />
          <Fact label="Rated compression" value={mm(part.ratedAxialCompressionMm)} />
          <Fact label="Rated extension" value={mm(part.ratedAxialExtensionMm)} />
          <Fact label="Lateral offset" value={mm(part.lateralOffsetMm)} />
          <Fact label="Rated rotation" value={`${part.ratedAngularDeg}°`} />
          <Fact label="Rated cycles" value={part.ratedCycles === null ? 'Not rated' : part.ratedCycles.toLocaleString('en-GB')} />
          <Fact label="Mean diameter" value={part.meanDiameterMm === null ? 'Not given (estimated)' : mm(part.meanDiameterMm)} />
          <Fact label="Overall length" value={mm(part.overallLengthMm ?? part.liveLengthMm)} />
          <Fact label="Maximum temperature" value={formatTemp(part.maxTempC, units)} />
          <Fact label="Cuff alloy" value={part.cuffUns ? `UNS ${part.cuffUns}` : 'Not stated'} />
          <Fact label="Price" value={`${part.price.toFixed(2)} ${part.currency}`} />
        </View>
      )}
      {failure ? <ErrorBanner message={failure} /> : null}
      {onUpdate && !editing ? (
        <View style={styles.actions}>
          <Button label="Edit" accessibilityLabel={`Edit ${part.code}`} variant="secondary" compact onPress={() => setEditing(true)} />
          <Button
            label={part.active ? 'Deactivate' : 'Reactivate'}
            accessibilityLabel={`${part.active ? 'Deactivate' : 'Reactivate'} ${part.code}`}
            variant={part.active ? 'ghost' : 'secondary'}
            compact
            loading={pending}
            onPress={() => void setActive(!part.active)}
          />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
  tags: { flexDirection: 'row', gap: spacing.xs },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
