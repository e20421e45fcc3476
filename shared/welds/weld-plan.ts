import { metalName, type WeldMetal } from './weld-metals';
import { pairWeld, WPS_CAUTION, type PairRule } from './weld-pairing';
import type { MetalRef, WeldKind, WeldSite } from './weld-sites';

export type WeldStatus = 'rule' | 'no_rule' | 'refused' | 'metal_unknown';

export interface WeldView {
  /** W1, W2… in build order across the job. */
  number: string;
  key: string;
  runId: string;
  kind: WeldKind;
  where: string;
  /** Both base metals; null where the metal is not known (see `message`). */
  metals: [WeldMetal | null, WeldMetal | null];
  /** "Type 321 (S32100) to Carbon steel 1020 (G10200)". */
  pair: string;
  status: WeldStatus;
  filler: string | null;
  fillerSpec: string | null;
  purge: string | null;
  notes: string | null;
  procedureRef: string | null;
  source: string | null;
  rule: { id: string; version: number } | null;
  /** Why there is no filler: refused, no rule, or a metal not known. */
  message: string | null;
  fumes: string[];
}

export interface WeldPlanRun {
  runId: string;
  runName: string;
  position: number;
  welds: WeldView[];
}

export interface WeldPlan {
  jobId: string;
  runs: WeldPlanRun[];
  /** How many welds have no filler yet (no rule, refused or a metal not known). */
  openCount: number;
  /** A qualified procedure and welder govern; said on every plan. */
  governs: string;
}

export type MetalLookup = (ref: MetalRef) => WeldMetal | { missing: string };

const known = (m: WeldMetal | { missing: string }): m is WeldMetal => !('missing' in m);
const nameOf = (m: WeldMetal | { missing: string }) => (known(m) ? metalName(m) : 'metal not known');

function weldView(site: WeldSite, n: number, lookup: MetalLookup, rules: readonly PairRule[]): WeldView {
  const [a, b] = site.metals.map(lookup) as [WeldMetal | { missing: string }, WeldMetal | { missing: string }];
  const base = {
    number: `W${n}`,
    key: site.key,
    runId: site.runId,
    kind: site.kind,
    where: site.where,
    metals: [known(a) ? a : null, known(b) ? b : null] as [WeldMetal | null, WeldMetal | null],
    pair: `${nameOf(a)} to ${nameOf(b)}`,
  };
  const empty = { filler: null, fillerSpec: null, purge: null, notes: null, procedureRef: null, source: null, rule: null };
  if (!known(a) || !known(b)) {
    const missing = [a, b].filter((m): m is { missing: string } => !known(m)).map((m) => m.missing);
    return { ...base, ...empty, status: 'metal_unknown', message: missing.join('; '), fumes: [] };
  }
  const outcome = pairWeld(a, b, rules);
  if (outcome.status !== 'rule') return { ...base, ...empty, status: outcome.status, message: outcome.message, fumes: outcome.fumes };
  const r = outcome.rule;
  return {
    ...base,
    status: 'rule',
    filler: r.filler,
    fillerSpec: r.fillerSpec,
    purge: r.purge,
    notes: r.notes || null,
    procedureRef: r.procedureRef || null,
    source: r.source,
    rule: { id: r.id, version: r.version },
    message: null,
    fumes: outcome.fumes,
  };
}

/** The job's welds per run, each paired against the shop's rules. */
export function weldPlan(jobId: string, runs: readonly { id: string; name: string; position: number }[], sites: readonly WeldSite[], lookup: MetalLookup, rules: readonly PairRule[]): WeldPlan {
  const views = sites.map((s, i) => weldView(s, i + 1, lookup, rules));
  return {
    jobId,
    runs: runs.map((r) => ({ runId: r.id, runName: r.name, position: r.position, welds: views.filter((w) => w.runId === r.id) })),
    openCount: views.filter((w) => w.status !== 'rule').length,
    governs: WPS_CAUTION,
  };
}
