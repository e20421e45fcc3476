import { useCallback, useState } from 'react';
import type { UnitSystem } from '../shared/units';

const KEY = 'dilato.customer-units';

/** The browser's storage where there is one (the web page); native and tests keep the choice in memory. */
const storage = (): Storage | null => {
  try {
    return typeof globalThis.localStorage === 'undefined' ? null : globalThis.localStorage;
  } catch {
    return null;
  }
};

function remembered(): UnitSystem | null {
  const v = storage()?.getItem(KEY);
  return v === 'metric' || v === 'imperial' ? v : null;
}

/**
 * The units the customer reads their quote in, without an account: remembered in this browser,
 * else the units of whoever prepared the quote.
 */
export function useCustomerUnits(preparedIn: UnitSystem): [UnitSystem, (units: UnitSystem) => void] {
  const [chosen, setChosen] = useState<UnitSystem | null>(remembered);
  const choose = useCallback((units: UnitSystem) => {
    setChosen(units);
    try {
      storage()?.setItem(KEY, units);
    } catch {
      // A browser that refuses storage (private mode) still switches for this visit.
    }
  }, []);
  return [chosen ?? preparedIn, choose];
}
