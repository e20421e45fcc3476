import type { AlloySummary } from '../../shared/schemas/alloy';
import type { UnitSystem } from '../../shared/units';
import { formatGrowth, formatPrice, formatTemp } from './format';
import type { TagTone } from '../ui/tag';

/** The list's values for one alloy, as the card and the table both show them. */
export function summaryValues(alloy: AlloySummary, units: UnitSystem) {
  return {
    continuous: formatTemp(alloy.maxContinuousC, units),
    intermittent: formatTemp(alloy.maxIntermittentC, units),
    growth: alloy.growthAtMmPerM === null ? 'above data' : formatGrowth(alloy.growthAtMmPerM, units),
    price: formatPrice(alloy.pricePerKg, alloy.currency, units),
  };
}

/** Status words an editor needs in the list; readers only ever see published alloys. */
export function statusTags(alloy: AlloySummary): { label: string; tone: TagTone }[] {
  const tags: { label: string; tone: TagTone }[] = [];
  if (alloy.status === 'draft') tags.push({ label: 'Draft, never published', tone: 'warning' });
  if (alloy.status === 'retired') tags.push({ label: 'Retired', tone: 'danger' });
  if (alloy.status !== 'draft' && alloy.hasDraft) tags.push({ label: 'Draft open', tone: 'primary' });
  return tags;
}
