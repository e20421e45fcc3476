import type { DesignBasis } from './types';

/**
 * Defaults of the shop's design basis. The travel share is common practice, no published
 * source: sizing a bellows so that the computed movement uses no more than about 50–80 % of
 * its rating is the usual trade habit; 70 % is the middle of that range. The coldest start of
 * −20 °C covers a winter start in most of Europe and North America; a shop in a colder place
 * sets its own.
 */
export const DEFAULT_DESIGN_BASIS: DesignBasis = { travelShare: 0.7, coldestAmbientC: -20 };

export const TRAVEL_SHARE_NOTE = 'Share of rated travel the movement may use: a shop setting; the default is common practice, no published source';

export function designBasis(given?: Partial<DesignBasis>): DesignBasis {
  return { ...DEFAULT_DESIGN_BASIS, ...given };
}
