import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useUnits } from '../../hooks/use-units';
import { EMPTY_FLEX_PART, FlexPartForm } from '../flex-parts/flex-part-form';
import { FlexPartCard } from '../flex-parts/flex-part-card';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { layout, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useCreateFlexPartMutation, useFlexPartsQuery, useUpdateFlexPartMutation } from '../../hooks/use-flex-parts';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function FlexPartsScreen() {
  const { data: me } = useSessionQuery();
  const isAdmin = me?.role === 'admin';
  const parts = useFlexPartsQuery(isAdmin);
  const create = useCreateFlexPartMutation();
  const update = useUpdateFlexPartMutation();
  const twoColumns = useWindowDimensions().width >= layout.wideBreakpoint;
  const units = useUnits();

  useScreenTitle('Flex parts');
  return (
    <Screen wide>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Flex parts
        </Text>
        <Text tone="muted">
          The flex sections the calculator sizes from: bore, live length and the movement each is rated for.
          {isAdmin ? '' : ' An admin keeps this list.'}
        </Text>
      </View>
      <View style={twoColumns && isAdmin ? styles.columns : styles.stack}>
        <View style={[styles.list, twoColumns && isAdmin && styles.listColumn]}>
          {parts.isPending ? (
            <LoadingState label="Loading flex parts…" />
          ) : parts.isError ? (
            <ErrorBanner title="The flex parts did not load" message={messageOf(parts.error)} onRetry={() => void parts.refetch()} />
          ) : parts.data.length === 0 ? (
            <EmptyState title="No flex parts yet" message={isAdmin ? 'Add the first with the form.' : 'Ask an admin to add the shop’s flex sections.'} />
          ) : (
            parts.data.map((part) => (
              <FlexPartCard
                key={part.id}
                part={part}
                units={units}
                onUpdate={isAdmin ? (changes) => update.mutateAsync({ id: part.id, changes }) : undefined}
              />
            ))
          )}
        </View>
        {isAdmin ? (
          <Card style={twoColumns ? styles.formColumn : undefined}>
            <Text variant="heading" headingLevel={2}>
              Add a flex part
            </Text>
            <FlexPartForm defaultValues={EMPTY_FLEX_PART} submitLabel="Add flex part" onSubmit={(values) => create.mutateAsync(values)} />
          </Card>
        ) : null}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  stack: { gap: spacing.xl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  list: { gap: spacing.md },
  listColumn: { flex: 3 },
  formColumn: { flex: 2 },
});
