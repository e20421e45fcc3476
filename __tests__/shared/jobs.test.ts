import { FIXED_POINTS, fixedPointKind, fixedPointLabel, isRestrained } from '../../shared/jobs/fixed-points';
import { jobTotals } from '../../shared/jobs/job-totals';
import { runFieldPath, runFields, toCalcRequest } from '../../shared/jobs/run-input';
import { matchTubePreset, TUBE_PRESETS } from '../../shared/jobs/tube-presets';
import type { RunResult } from '../../shared/engine/types';
import { runCreateSchema, runFieldsSchema, type RunFields } from '../../shared/schemas/jobs';

const fields = (over: Partial<RunFields> = {}): RunFields => ({
  name: 'Run',
  alloyId: 'a',
  tube: { odMm: 76.2, wallMm: 1.651 },
  installTempC: 20,
  segments: [{ lengthMm: 500, startTempC: 700, endTempC: 600 }],
  startFixing: 'flange',
  endFixing: 'flange',
  joint: { type: 'none' },
  supports: [],
  nearby: [],
  startFlangeAlloyId: null,
  endFlangeAlloyId: null,
  notes: '',
  ...over,
});

describe('fixed points', () => {
  it('when listed, then every id is unique and has a label and a kind', () => {
    const ids = FIXED_POINTS.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    expect(ids).toEqual(expect.arrayContaining(['flange', 'anchor_bracket', 'sliding_bracket', 'v_band', 'flex_section', 'slip_joint', 'turbo_outlet', 'manifold_flange']));
    expect(fixedPointLabel('v_band')).toBe('V-band clamp');
    expect(fixedPointKind('sliding_bracket')).toBe('guide');
  });

  it('when both ends hold the tube and no joint is fitted, then the run is restrained; a joint or a sliding end frees it', () => {
    expect(isRestrained('turbo_outlet', 'anchor_bracket', 'none')).toBe(true);
    expect(isRestrained('turbo_outlet', 'anchor_bracket', 'flex')).toBe(false);
    expect(isRestrained('turbo_outlet', 'sliding_bracket', 'none')).toBe(false);
    expect(isRestrained('slip_joint', 'free_end', 'none')).toBe(false);
  });
});

describe('tube presets', () => {
  it('when 3 in × 16 ga is looked up, then it is 76.2 × 1.651 mm (1 in = 25.4 mm; 16 BWG = 0.065 in, reference-data §6)', () => {
    const preset = TUBE_PRESETS.find((p) => p.odIn === 3 && p.gauge === 16)!;
    expect(preset).toMatchObject({ odMm: 76.2, wallMm: 1.651, label: '3 in × 16 ga' });
    expect(matchTubePreset(76.2, 1.651)).toBe(preset);
    expect(matchTubePreset(76.2, 1.9)).toBeNull();
  });

  it('when any preset is read, then its wall is less than half its OD, as the run schema demands', () => {
    for (const p of TUBE_PRESETS) expect(p.wallMm).toBeLessThan(p.odMm / 2);
  });
});

describe('run inputs for the calculator', () => {
  it('when a run has a flex joint, then the calculator gets flex options; a slip joint gives slip options without the type', () => {
    expect(toCalcRequest(fields({ joint: { type: 'flex', atMm: 100 } })).flex).toEqual({ atMm: 100 });
    const slip = { inner: { tempC: 600 }, outer: { tempC: 550 }, coldClearanceMm: 0.3, coldEngagementMm: 80, coldAxialGapMm: 20 };
    const req = toCalcRequest(fields({ joint: { type: 'slip', ...slip } }));
    expect(req.slip).toEqual(slip);
    expect(req.flex).toBeUndefined();
    expect(toCalcRequest(fields())).not.toHaveProperty('slip');
  });

  it('when the calculator names a field, then the run names the same input', () => {
    expect(runFieldPath('flex.atMm')).toBe('joint.atMm');
    expect(runFieldPath('slip.outer.tempC')).toBe('joint.outer.tempC');
    expect(runFieldPath('alloy.cte')).toBe('alloyId');
    expect(runFieldPath('segments.2.endTempC')).toBe('segments.2.endTempC');
    expect(runFields({ 'alloy.cte': 'x', alloy: 'y', installTempC: 'z' })).toEqual({ alloyId: 'x', installTempC: 'z' });
  });

  it('when a new run gives only the essentials, then install 20 °C, flanged ends, no joint and no notes are assumed', () => {
    const parsed = runCreateSchema.parse({ name: 'R', alloyId: 'a', tube: { odMm: 50.8, wallMm: 1.2 }, segments: [{ lengthMm: 10, startTempC: 300, endTempC: 300 }] });
    expect(parsed).toMatchObject({ installTempC: 20, startFixing: 'flange', endFixing: 'flange', joint: { type: 'none' }, notes: '' });
    expect(runFieldsSchema.safeParse(fields({ joint: { type: 'flex', atMm: 501 } })).success).toBe(false);
    expect(runFieldsSchema.safeParse(fields({ joint: { type: 'flex', atMm: 500 } })).success).toBe(true);
  });
});

describe('job totals', () => {
  const result = (growthMm: number, massKg: number, materialCost: number, totalLengthMm: number, peakTempC: number) =>
    ({ growthMm, massKg, materialCost, totalLengthMm, peakTempC }) as RunResult;

  it('when some runs have no result, then every total, length and peak included, leaves them out', () => {
    const totals = jobTotals([
      { result: result(5, 2, 20, 400, 900), currency: 'EUR' },
      { result: result(7, 3, 9, 600, 700), currency: 'EUR' },
      // A run saved at 5000 °C has no result: it must not set the peak or add its length.
      { result: null, currency: null },
    ]);
    expect(totals).toEqual({
      growthMm: 12,
      massKg: 5,
      materialCost: 29,
      currency: 'EUR',
      costNote: null,
      lengthMm: 1000,
      peakTempC: 900,
      runCount: 3,
      runsWithProblems: 1,
    });
  });

  it('when runs are priced in different currencies, then there is no total cost', () => {
    const totals = jobTotals([
      { result: result(5, 2, 20, 400, 900), currency: 'EUR' },
      { result: result(7, 3, 9, 600, 700), currency: 'USD' },
    ]);
    expect(totals.materialCost).toBeNull();
    expect(totals.currency).toBeNull();
    expect(totals.costNote).toMatch(/EUR and USD.*not added up/);
    expect(totals.growthMm).toBe(12);
  });

  it('when a job has no runs, then everything is zero and there is no peak', () => {
    expect(jobTotals([])).toMatchObject({ growthMm: 0, massKg: 0, materialCost: 0, lengthMm: 0, peakTempC: null, runCount: 0 });
  });
});
