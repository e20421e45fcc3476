import { useMemo } from 'react';
import { useAlloyQuery } from '../../hooks/use-alloys';
import { useFlexPartsQuery } from '../../hooks/use-flex-parts';
import { useShopSettingsQuery } from '../../hooks/use-shop-settings';
import { designBasisOf } from '../../shared/schemas/shop-settings';
import { toAlloyData } from '../../shared/catalogue/to-alloy-data';
import { calculateRun } from '../../shared/engine/calculate-run';
import { isEngineInputError } from '../../shared/engine/errors';
import type { RunResult } from '../../shared/engine/types';
import { toSizingPart } from '../../shared/catalogue/flex-sizing-part';
import { runFields, toCalcRequest } from '../../shared/jobs/run-input';
import { runFieldsSchema, type AlloyUsed, type RunFields } from '../../shared/schemas/jobs';
import type { FieldMessages } from './field-errors';

/** The same value object while its key stays the same, so memoised children skip a render. */
export function useStableValue<T>(value: T, key: string): T {
  // eslint-disable-next-line react-hooks/exhaustive-deps
  return useMemo(() => value, [key]);
}

export type LiveResult =
  | { state: 'waiting'; message: string; fields: FieldMessages }
  | { state: 'loading' }
  | { state: 'unavailable'; message: string }
  | { state: 'outside'; message: string; fields: FieldMessages; alloy: AlloyUsed }
  | { state: 'ok'; result: RunResult; alloy: AlloyUsed; currency: string };

/**
 * The run computed in the browser by the shared engine from the published data, as the server will on
 * save: in the render that follows the input event (the engine takes well under a millisecond). The
 * answer object stays the same while the calculator's inputs do, so typing a name or notes leaves the
 * results and charts alone.
 */
export function useLiveResult(fields: RunFields): LiveResult {
  const key = JSON.stringify(fields);
  // eslint-disable-next-line react-hooks/exhaustive-deps
  const parsed = useMemo(() => runFieldsSchema.safeParse(fields), [key]);
  const calcKey = parsed.success ? JSON.stringify(toCalcRequest(parsed.data)) : `invalid ${key}`;
  const alloyId = fields.alloyId || undefined;
  const alloy = useAlloyQuery(alloyId);
  const slip = fields.joint.type === 'slip' ? fields.joint : null;
  const inner = useAlloyQuery(slip?.inner.alloyId);
  const outer = useAlloyQuery(slip?.outer.alloyId);
  const flex = useFlexPartsQuery(false);
  const settings = useShopSettingsQuery();

  return useMemo((): LiveResult => {
    if (!parsed.success) {
      const messages: FieldMessages = {};
      for (const issue of parsed.error.issues) {
        const path = issue.path.map(String).join('.');
        if (!(path in messages)) messages[path] = issue.message;
      }
      return { state: 'waiting', message: parsed.error.issues[0]?.message ?? 'Check the inputs', fields: messages };
    }
    if (alloy.isPending || (slip?.inner.alloyId && inner.isPending) || (slip?.outer.alloyId && outer.isPending)) return { state: 'loading' };
    if (fields.joint.type === 'flex' && flex.isPending) return { state: 'loading' };
    if (fields.joint.type !== 'none' && settings.isPending) return { state: 'loading' };
    const published = alloy.data?.published;
    if (!published || alloy.data?.status !== 'published') {
      return { state: 'unavailable', message: alloy.isError ? 'The alloy’s data did not load.' : 'This alloy has no published data to compute with.' };
    }
    const used: AlloyUsed = { id: alloy.data.id, designation: published.designation, uns: published.uns, version: published.version, status: 'published' };
    const member = (q: typeof inner) => (q.data?.published ? toAlloyData(q.data.published) : undefined);
    try {
      const result = calculateRun(toCalcRequest(parsed.data), toAlloyData(published, alloy.data.sources), {
        flexParts: (flex.data ?? []).map(toSizingPart),
        slipAlloys: { inner: member(inner), outer: member(outer) },
        design: settings.data ? designBasisOf(settings.data) : undefined,
      });
      return { state: 'ok', result, alloy: used, currency: published.currency };
    } catch (error) {
      if (!isEngineInputError(error)) throw error;
      const mapped = runFields(error.fields);
      const first = Object.values(mapped)[0] ?? error.message;
      return { state: 'outside', message: `The published data of ${used.designation}, version ${used.version}, does not cover this run: ${first}.`, fields: mapped, alloy: used };
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [calcKey, alloy.isPending, alloy.data, alloy.isError, inner.isPending, inner.data, outer.isPending, outer.data, flex.isPending, flex.data, settings.isPending, settings.data]);
}
