import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { ALLOY_FAMILIES, type AlloyFamily } from '../../shared/schemas/alloy';
import { formatQuantity, fromDisplay, growthBasisWords, unitLabel, type UnitSystem } from '../../shared/units';
import { SegmentedControl } from '../ui/segmented-control';
import { TextField } from '../ui/text-field';
import { CheckBox } from '../ui/check-box';
import { familyLabel } from './format';

export type AlloySort = 'designation' | 'limit' | 'expansion' | 'price';

/** What the person typed, kept as text so that a half-typed number is not thrown away. */
export interface AlloyFilterValues {
  search: string;
  family: AlloyFamily | 'all';
  minService: string;
  at: string;
  sort: AlloySort;
  includeUnpublished: boolean;
}

export const DEFAULT_FILTERS: AlloyFilterValues = {
  search: '',
  family: 'all',
  minService: '',
  at: '800',
  sort: 'designation',
  includeUnpublished: false,
};

const FAMILY_OPTIONS = [
  { value: 'all' as const, label: 'All families' },
  ...ALLOY_FAMILIES.map((f) => ({ value: f, label: familyLabel(f) })),
];

const SORT_OPTIONS = [
  { value: 'designation' as const, label: 'Name' },
  { value: 'limit' as const, label: 'Service limit' },
  { value: 'expansion' as const, label: 'Growth' },
  { value: 'price' as const, label: 'Price' },
];

export interface AlloyFiltersProps {
  values: AlloyFilterValues;
  onChange: (values: AlloyFilterValues) => void;
  units: UnitSystem;
  /** Engineers and admins may also see drafts and retired alloys. */
  canSeeUnpublished: boolean;
  atError?: string;
  minServiceError?: string;
}

export function AlloyFilters({ values, onChange, units, canSeeUnpublished, atError, minServiceError }: AlloyFiltersProps) {
  const set = <K extends keyof AlloyFilterValues>(key: K, value: AlloyFilterValues[K]) => onChange({ ...values, [key]: value });
  const t = unitLabel('temperature', units);
  return (
    <View style={styles.wrapper}>
      <TextField
        label="Search designation or UNS"
        value={values.search}
        onChangeText={(v) => set('search', v)}
        autoCapitalize="characters"
        autoCorrect={false}
        inputMode="search"
      />
      <View style={styles.pair}>
        <View style={styles.half}>
          <TextField
            label={`Minimum service temperature (${t})`}
            value={values.minService}
            onChangeText={(v) => set('minService', v)}
            inputMode="numeric"
            error={minServiceError}
            hint="Continuous limit at least this"
          />
        </View>
        <View style={styles.half}>
          <TextField
            label={`Growth at (${t})`}
            value={values.at}
            onChangeText={(v) => set('at', v)}
            inputMode="numeric"
            error={atError}
            hint={`From ${formatQuantity('temperature', 20, units).text}, ${growthBasisWords(units)} of tube`}
          />
        </View>
      </View>
      <SegmentedControl label="Family" options={FAMILY_OPTIONS} value={values.family} onChange={(v) => set('family', v)} />
      <SegmentedControl label="Sort by" options={SORT_OPTIONS} value={values.sort} onChange={(v) => set('sort', v)} />
      {canSeeUnpublished ? (
        <CheckBox
          label="Include drafts and retired alloys"
          checked={values.includeUnpublished}
          onChange={(v) => set('includeUnpublished', v)}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrapper: { gap: spacing.md },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  half: { flexGrow: 1, flexBasis: 200 },
});

function parseTemp(text: string, units: UnitSystem): number | undefined | null {
  if (text.trim() === '') return undefined;
  const n = Number(text.replace(',', '.'));
  return Number.isFinite(n) ? fromDisplay('temperature', n, units) : null;
}

/** The typed filters as list parameters (SI), with a message for any box that does not hold a number. */
export function toListParams(values: AlloyFilterValues, units: UnitSystem) {
  const minServiceC = parseTemp(values.minService, units);
  const at = parseTemp(values.at, units);
  const atOk = typeof at === 'number' && at >= -50 && at <= 1500;
  const atC = atOk ? at : fromDisplay('temperature', Number(DEFAULT_FILTERS.at), units);
  return {
    params: {
      search: values.search.trim() || undefined,
      family: values.family === 'all' ? undefined : values.family,
      minServiceC: minServiceC ?? undefined,
      sort: values.sort,
      atC,
      includeDrafts: values.includeUnpublished || undefined,
      includeRetired: values.includeUnpublished || undefined,
    },
    atC,
    minServiceError: minServiceC === null ? 'Enter a number' : undefined,
    atError: atOk || values.at.trim() === '' ? undefined : `Enter a temperature from ${formatQuantity('temperature', -50, units).text.replace('-', '−')} to ${formatQuantity('temperature', 1500, units).text}`,
  };
}
