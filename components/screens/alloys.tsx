import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { AlloyCard } from '../alloys/alloy-card';
import { AlloyFilters, DEFAULT_FILTERS, toListParams } from '../alloys/alloy-filters';
import { AlloyTable } from '../alloys/alloy-table';
import { CompareBar, MAX_COMPARE } from '../alloys/compare-bar';
import { CsvTools } from '../alloys/csv-tools';
import { useUnits } from '../../hooks/use-units';
import { formatTemp } from '../alloys/format';
import { growthBasisWords } from '../../shared/units';
import { Button } from '../ui/button';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadMore } from '../ui/load-more';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { layout, spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { CATALOGUE_CSV_URL, useAlloyPagesQuery, useCsvImport } from '../../hooks/use-alloys';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function AlloyListScreen() {
  const router = useRouter();
  const { data: me } = useSessionQuery();
  const canEdit = me?.role === 'engineer' || me?.role === 'admin';
  const units = useUnits();
  const [filters, setFilters] = useState(DEFAULT_FILTERS);
  const [selected, setSelected] = useState<string[]>([]);
  const { params, atC, atError, minServiceError } = toListParams(filters, units);
  const alloys = useAlloyPagesQuery(params);
  const csvImport = useCsvImport();
  const wide = useWindowDimensions().width >= layout.wideBreakpoint;

  const toggle = (id: string, on: boolean) =>
    setSelected((ids) => (on ? (ids.includes(id) || ids.length >= MAX_COMPARE ? ids : [...ids, id]) : ids.filter((x) => x !== id)));
  const full = selected.length >= MAX_COMPARE;

  useScreenTitle('Alloy catalogue');
  return (
    <Screen wide>
      <View style={styles.header}>
        <View style={styles.titleRow}>
          <Text variant="title" headingLevel={1}>
            Alloy catalogue
          </Text>
          {canEdit ? <Button label="New alloy" compact onPress={() => router.push('/alloys/new')} /> : null}
        </View>
        <Text tone="muted">
          The shop’s tube alloys with the source behind every value. Growth is {growthBasisWords(units)} of tube heated from {formatTemp(20, units)}.
        </Text>
      </View>

      <AlloyFilters
        values={filters}
        onChange={setFilters}
        units={units}
        canSeeUnpublished={canEdit}
        atError={atError}
        minServiceError={minServiceError}
      />
      <CompareBar selectedIds={selected} onClear={() => setSelected([])} />

      {alloys.isPending ? (
        <LoadingState label="Loading alloys…" />
      ) : alloys.isError ? (
        <ErrorBanner title="The catalogue did not load" message={messageOf(alloys.error)} onRetry={() => void alloys.refetch()} />
      ) : alloys.items.length === 0 ? (
        <EmptyState
          title="No alloys match"
          message="Clear the search or lower the minimum service temperature to see more."
          action={<Button label="Clear filters" variant="secondary" compact onPress={() => setFilters(DEFAULT_FILTERS)} />}
        />
      ) : (
        <View style={styles.section}>
          <Text tone="muted" aria-live="polite">
            {alloys.total} {alloys.total === 1 ? 'alloy' : 'alloys'}
          </Text>
          {wide ? (
            <AlloyTable
              alloys={alloys.items}
              atC={atC}
              units={units}
              selectedIds={selected}
              onToggleCompare={toggle}
              compareFull={full}
            />
          ) : (
            <View role="list" aria-label="Alloys" style={styles.cards}>
              {alloys.items.map((alloy) => (
                <View key={alloy.id} role="listitem">
                  <AlloyCard
                    alloy={alloy}
                    atC={atC}
                    units={units}
                    selected={selected.includes(alloy.id)}
                    compareDisabled={full}
                    onToggleCompare={(on) => toggle(alloy.id, on)}
                  />
                </View>
              ))}
            </View>
          )}
          <LoadMore
            noun="alloys"
            shown={alloys.items.length}
            total={alloys.total}
            hasMore={alloys.hasNextPage}
            loading={alloys.isFetchingNextPage}
            onLoadMore={() => void alloys.fetchNextPage()}
          />
        </View>
      )}

      {canEdit ? <CsvTools exportHref={CATALOGUE_CSV_URL} importer={csvImport} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  titleRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.md },
  section: { gap: spacing.sm },
  cards: { gap: spacing.md },
});
