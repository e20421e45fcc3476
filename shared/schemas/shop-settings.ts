import { z } from 'zod';
import { DEFAULT_DESIGN_BASIS } from '../engine/design-basis';
import type { DesignBasis } from '../engine/types';
import { ALLOY_FAMILIES, type AlloyFamily } from './alloy';
import { DEFAULT_NEARBY_MINIMUMS_MM, NEARBY_KINDS, type NearbyKind } from '../jobs/nearby';
import { DEFAULT_SYSTEM_BASIS, type SystemBasis } from '../jobs/system-basis';

const money = (what: string) => z.number({ error: `${what} must be a number` }).min(0, { error: `${what} cannot be negative` });
const factor = z.number({ error: 'Enter a factor' }).min(0.1, { error: 'At least 0.1' }).max(10, { error: 'At most 10' });

/** The shop's quoting rules, edited by an admin. */
export const shopSettingsSchema = z.object({
  shopName: z.string({ error: 'Enter the shop’s name' }).trim().min(1, { error: 'Enter the shop’s name' }).max(120),
  currency: z.string().trim().toUpperCase().regex(/^[A-Z]{3}$/, { error: 'Use a three-letter currency code' }),
  labourRatePerHour: money('Labour rate'),
  hoursPerRun: z.number({ error: 'Enter hours' }).min(0, { error: 'Cannot be negative' }).max(200, { error: 'At most 200 hours' }),
  /** Welding and fitting time of each family relative to austenitic stainless (= 1). */
  weldTimeFactors: z.object(
    Object.fromEntries(ALLOY_FAMILIES.map((f) => [f, factor])) as Record<AlloyFamily, typeof factor>,
  ),
  scrapAllowancePct: z.number({ error: 'Enter a percentage' }).min(0, { error: 'Cannot be negative' }).max(100, { error: 'At most 100 %' }),
  marginPct: z.number({ error: 'Enter a percentage' }).min(0, { error: 'Cannot be negative' }).max(300, { error: 'At most 300 %' }),
  /** Whole percent of an accepted quote's total the customer pays up front; 0 turns deposits off. */
  depositSharePct: z
    .number({ error: 'Enter a percentage' })
    .int({ error: 'Use a whole percent' })
    .min(0, { error: 'Cannot be negative' })
    .max(100, { error: 'At most 100 %' })
    .default(0),
  /** Share of a flex part's rated travel, or of a slip joint's gap, the computed movement may use. */
  travelSharePct: z
    .number({ error: 'Enter a percentage' })
    .min(20, { error: 'At least 20 %' })
    .max(100, { error: 'At most 100 %' })
    .default(DEFAULT_DESIGN_BASIS.travelShare * 100),
  /** Coldest ambient the shop's systems start from (winter start). */
  coldestStartC: z
    .number({ error: 'Enter a temperature' })
    .min(-50, { error: 'At least −50 °C, the lowest the calculator handles' })
    .max(40, { error: 'At most 40 °C' })
    .default(DEFAULT_DESIGN_BASIS.coldestAmbientC),
  /** A sliding support or hanger within this distance on each side of every flex and slip joint. */
  supportNearJointMm: z
    .number({ error: 'Enter a distance' })
    .min(10, { error: 'At least 10 mm' })
    .max(2000, { error: 'At most 2000 mm' })
    .default(DEFAULT_SYSTEM_BASIS.supportNearJointMm),
  /** The first support after a turbo or manifold flange within this distance, so the flange does not carry the pipe. */
  engineSupportMm: z
    .number({ error: 'Enter a distance' })
    .min(10, { error: 'At least 10 mm' })
    .max(3000, { error: 'At most 3000 mm' })
    .default(DEFAULT_SYSTEM_BASIS.engineSupportMm),
  /** Hot gap kept to each kind of nearby item. */
  nearbyMinimumsMm: z
    .object(
      Object.fromEntries(NEARBY_KINDS.map((k) => [k, z.number({ error: 'Enter a gap' }).min(0, { error: 'Cannot be negative' }).max(1000, { error: 'At most 1000 mm' })])) as Record<
        NearbyKind,
        z.ZodNumber
      >,
    )
    .default(DEFAULT_NEARBY_MINIMUMS_MM),
  /** True while the values are the seeded demo numbers rather than the shop's own. */
  isDemo: z.boolean().default(false),
});
export type ShopSettings = z.infer<typeof shopSettingsSchema>;

/** Demo values of an invented shop; an admin replaces them with the shop's own. */
export const DEMO_SHOP_SETTINGS: ShopSettings = {
  shopName: 'Kestrel Lane Exhaust Works',
  currency: 'EUR',
  labourRatePerHour: 68,
  hoursPerRun: 2.5,
  weldTimeFactors: {
    austenitic_stainless: 1,
    ferritic_stainless: 0.9,
    nickel_chromium: 1.6,
    nickel_iron_chromium: 1.4,
    titanium: 2.2,
    carbon_steel: 0.7,
  },
  scrapAllowancePct: 12,
  marginPct: 25,
  depositSharePct: 30,
  travelSharePct: DEFAULT_DESIGN_BASIS.travelShare * 100,
  coldestStartC: DEFAULT_DESIGN_BASIS.coldestAmbientC,
  supportNearJointMm: DEFAULT_SYSTEM_BASIS.supportNearJointMm,
  engineSupportMm: DEFAULT_SYSTEM_BASIS.engineSupportMm,
  nearbyMinimumsMm: DEFAULT_NEARBY_MINIMUMS_MM,
  isDemo: true,
};

/** The support and clearance part of the shop settings, as the system check takes it. */
export function systemBasisOf(settings: Pick<ShopSettings, 'supportNearJointMm' | 'engineSupportMm' | 'nearbyMinimumsMm'>): SystemBasis {
  return { supportNearJointMm: settings.supportNearJointMm, engineSupportMm: settings.engineSupportMm, nearbyMinimumsMm: settings.nearbyMinimumsMm };
}

/** The joint-design part of the shop settings, as the calculator takes it. */
export function designBasisOf(settings: Pick<ShopSettings, 'travelSharePct' | 'coldestStartC'>): DesignBasis {
  return { travelShare: settings.travelSharePct / 100, coldestAmbientC: settings.coldestStartC };
}
