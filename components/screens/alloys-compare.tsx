import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { CautionsNote } from '../ui/cautions-note';
import { MAX_COMPARE } from '../alloys/compare-bar';
import { CompareView } from '../alloys/compare-view';
import { formatTemp } from '../alloys/format';
import { UnitNumberField } from '../units/unit-number-field';
import { useUnits } from '../../hooks/use-units';
import { TextLink } from '../ui/text-link';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { messageOf } from '../../hooks/api-client';
import { useAlloyQueries } from '../../hooks/use-alloys';
import { growthBasisWords } from '../../shared/units';
import { useScreenTitle } from '../ui/use-screen-title';

const DEFAULT_AT_C = 800;

export default function CompareScreen() {
  const { ids: raw } = useLocalSearchParams<{ ids?: string }>();
  const ids = [...new Set((raw ?? '').split(',').filter(Boolean))].slice(0, MAX_COMPARE);
  const units = useUnits();
  const queries = useAlloyQueries(ids);
  // Kept in °C, so switching units mid-way changes the words, not the temperature.
  const [at, setAt] = useState<number>(DEFAULT_AT_C);
  const atC = Number.isFinite(at) ? at : DEFAULT_AT_C;

  const failed = queries.find((q) => q.isError);
  const loading = queries.some((q) => q.isPending);
  const versions = queries.flatMap((q) => {
    const a = q.data;
    const v = a?.published ?? a?.draft;
    return v ? [v] : [];
  });

  useScreenTitle('Compare alloys', 'Alloy catalogue');
  return (
    <Screen wide>
      <TextLink href="/alloys" label="← Catalogue" accessibilityLabel="Back to the catalogue" />
      <Text variant="title" headingLevel={1}>
        Compare alloys
      </Text>
      {ids.length < 2 ? (
        <EmptyState title="Pick at least two alloys" message="Tick 2 to 4 alloys in the catalogue, then choose Compare." action={<TextLink href="/alloys" label="Open the catalogue" />} />
      ) : loading ? (
        <LoadingState label="Loading the alloys…" />
      ) : failed ? (
        <ErrorBanner title="An alloy did not load" message={messageOf(failed.error)} onRetry={() => queries.forEach((q) => void q.refetch())} />
      ) : (
        <>
          <UnitNumberField
            label="Compare growth at"
            kind="temperature"
            units={units}
            value={at}
            onChange={setAt}
            error={Number.isFinite(at) ? undefined : 'Enter a temperature'}
            hint={`Each tube heated from ${formatTemp(20, units)}, ${growthBasisWords(units)}.`}
          />
          <CompareView alloys={versions} atC={atC} units={units} />
          <CautionsNote />
        </>
      )}
    </Screen>
  );
}
