import type { UnitSystem } from '../../shared/units';

/**
 * Metric is how the data sheets print the tables: a stored datum shows every figure it has
 * (16.667 µm/m·K stays 16.667). Converted to imperial, it shows at the trade's precision
 * (0.01 µin/in·°F, 0.1 Msi, 0.1 ksi, 0.001 lb/in³, 1 °F); either way only a typed value is stored.
 */
export const catalogueDecimals = (units: UnitSystem): number | undefined => (units === 'metric' ? 6 : undefined);
