import { DEFAULT_PREFERENCES } from '../shared/schemas/preferences';
import type { UnitSystem } from '../shared/units';
import { usePreferencesQuery } from './use-preferences';

/** The signed-in user's unit system; metric until the preference has loaded. */
export function useUnits(): UnitSystem {
  const { data } = usePreferencesQuery();
  return data?.unitSystem ?? DEFAULT_PREFERENCES.unitSystem;
}
