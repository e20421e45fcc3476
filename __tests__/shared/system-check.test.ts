import { calculateRun } from '../../shared/engine/calculate-run';
import { toCalcRequest } from '../../shared/jobs/run-input';
import { DEFAULT_SYSTEM_BASIS } from '../../shared/jobs/system-basis';
import { checkSystem } from '../../shared/jobs/system-check';
import { movementWords } from '../../shared/jobs/support-plan';
import type { RunFields, RunView } from '../../shared/schemas/jobs';
import { enStainlessElongation, enStainlessElongationIntegral, stainless304 } from './published';
import { wordPhrase } from '../../shared/units';

// 304 on the EN 1993-1-2 Annex C law; 3 in × 16 ga tube (76.2 × 1.651 mm).
const alloy = stainless304();
const TUBE = { odMm: 76.2, wallMm: 1.651 };
const MASS_PER_MM = (8000 * Math.PI * (76.2 - 1.651) * 1.651) / 1e9; // ρ·π·(OD − t)·t, kg/mm (reference-data §6)

let n = 0;
function run(over: Partial<RunFields>): RunView {
  const fields: RunFields = {
    name: `Run ${++n}`,
    alloyId: 'a',
    tube: TUBE,
    installTempC: 20,
    segments: [{ lengthMm: 1000, startTempC: 600, endTempC: 600 }],
    startFixing: 'flange',
    endFixing: 'flange',
    joint: { type: 'none' },
    supports: [],
    nearby: [],
    startFlangeAlloyId: null,
    endFlangeAlloyId: null,
    notes: '',
    ...over,
  };
  const result = calculateRun(toCalcRequest(fields), alloy, { flexParts: [] });
  return { ...fields, id: fields.name, jobId: 'j', position: n, alloy: null, result, problem: null, currency: 'EUR', createdAt: '', updatedAt: '' };
}
const codes = (runs: RunView[]) => checkSystem(runs, DEFAULT_SYSTEM_BASIS).findings.map((f) => f.code);

describe('stretches between held points', () => {
  it('when a run is held by flanges at both ends with no joint, then it is flagged with its growth (EN Annex C: 10.687 mm for 1 m at 600 °C)', () => {
    const f = checkSystem([run({})], DEFAULT_SYSTEM_BASIS).findings.find((x) => x.code === 'STRETCH_WITHOUT_JOINT');
    expect(f?.severity).toBe('danger');
    expect(wordPhrase(f?.message ?? '', 'metric')).toContain(`${(1000 * enStainlessElongation(600)).toFixed(1)} mm of growth`);
    // The same finding for an imperial reader: 1 in = 25.4 mm exactly (NIST SP 811 App. B).
    expect(wordPhrase(f?.message ?? '', 'imperial')).toContain(`${((1000 * enStainlessElongation(600)) / 25.4).toFixed(2)} in of growth`);
    expect(wordPhrase(f?.message ?? '', 'imperial')).not.toMatch(/ mm\b/);
  });

  it('when two runs meet at a sliding bracket between two flanges, then the whole stretch is flagged; a flex anywhere in it clears it', () => {
    const a = run({ endFixing: 'sliding_bracket' });
    const b = run({ startFixing: 'sliding_bracket' });
    const found = checkSystem([a, b], DEFAULT_SYSTEM_BASIS).findings.filter((x) => x.code === 'STRETCH_WITHOUT_JOINT');
    expect(found).toHaveLength(1);
    expect(wordPhrase(found[0].message, 'metric')).toContain(`${a.name}, ${b.name}`);
    expect(wordPhrase(found[0].message, 'metric')).toContain(`${(2000 * enStainlessElongation(600)).toFixed(1)} mm`);
    expect(codes([a, run({ startFixing: 'sliding_bracket', joint: { type: 'flex', atMm: 500 }, supports: [{ kind: 'hanger', atMm: 400 }, { kind: 'hanger', atMm: 600 }] })])).not.toContain('STRETCH_WITHOUT_JOINT');
  });

  it('when the stretch ends free or at a joint, then nothing is flagged', () => {
    expect(codes([run({ endFixing: 'free_end' })])).not.toContain('STRETCH_WITHOUT_JOINT');
    expect(codes([run({ endFixing: 'slip_joint' })])).not.toContain('STRETCH_WITHOUT_JOINT');
  });
});

describe('the engine flange does not carry the pipe', () => {
  it('when nothing supports a run from the turbo outlet, then its whole tube mass is said to hang there', () => {
    const r = run({ startFixing: 'turbo_outlet', endFixing: 'free_end', segments: [{ lengthMm: 800, startTempC: 800, endTempC: 700 }] });
    const f = checkSystem([r], DEFAULT_SYSTEM_BASIS).findings.find((x) => x.code === 'ENGINE_CARRIES_WEIGHT');
    expect(f?.severity).toBe('danger');
    expect(wordPhrase(f?.message ?? '', 'metric')).toContain(`${(MASS_PER_MM * 800).toFixed(1)} kg hangs on the turbo outlet`);
  });

  it('when a run joins two engine flanges (manifold to turbo), then it counts as part of the engine, not a load on it', () => {
    const collector = run({ startFixing: 'manifold_flange', endFixing: 'turbo_inlet', segments: [{ lengthMm: 340, startTempC: 900, endTempC: 870 }] });
    expect(codes([collector])).not.toContain('ENGINE_CARRIES_WEIGHT');
    expect(codes([collector])).toContain('STRETCH_WITHOUT_JOINT');
  });

  it('when the first support is beyond the shop’s distance, then the flange carries about half of that span', () => {
    const far = run({ startFixing: 'turbo_outlet', endFixing: 'free_end', supports: [{ kind: 'hanger', atMm: 500 }] });
    const f = checkSystem([far], DEFAULT_SYSTEM_BASIS).findings.find((x) => x.code === 'ENGINE_CARRIES_WEIGHT');
    expect(f?.severity).toBe('warning');
    // Simply supported span of 500 mm: each end carries half its weight (beam statics).
    expect(wordPhrase(f?.message ?? '', 'metric')).toContain(`about ${((MASS_PER_MM * 500) / 2).toFixed(1)} kg`);
    expect(codes([run({ startFixing: 'turbo_outlet', endFixing: 'free_end', supports: [{ kind: 'hanger', atMm: 250 }] })])).not.toContain('ENGINE_CARRIES_WEIGHT');
  });
});

describe('supports beside joints', () => {
  const flexRun = (supports: RunFields['supports']) => run({ startFixing: 'flange', endFixing: 'flange', joint: { type: 'flex', atMm: 500 }, supports });

  it('when a flex has a support within 150 mm on each side (common practice, no published source), then nothing is flagged', () => {
    expect(codes([flexRun([{ kind: 'sliding', atMm: 400 }, { kind: 'hanger', atMm: 600 }])])).not.toContain('JOINT_UNSUPPORTED');
  });

  it('when one side has none, then that side is named', () => {
    const f = checkSystem([flexRun([{ kind: 'sliding', atMm: 400 }])], DEFAULT_SYSTEM_BASIS).findings.filter((x) => x.code === 'JOINT_UNSUPPORTED');
    expect(f).toHaveLength(1);
    expect(wordPhrase(f[0].message, 'metric')).toContain('end side of the flex section');
  });

  it('when the flex has no position, then the check asks for it', () => {
    expect(codes([run({ joint: { type: 'flex' } })])).toContain('FLEX_POSITION_MISSING');
  });
});

describe('the support plan', () => {
  it('when a run grows from an anchor, then a sliding support must let it slide by the growth up to its place (EN Annex C, closed form)', () => {
    const r = run({ startFixing: 'anchor_bracket', endFixing: 'free_end', segments: [{ lengthMm: 1000, startTempC: 800, endTempC: 600 }], supports: [{ kind: 'sliding', atMm: 500 }] });
    const plan = checkSystem([r], DEFAULT_SYSTEM_BASIS).supports;
    expect(plan.map((s) => s.role)).toEqual(['anchor', 'slide']);
    // Linear 800 → 700 °C over the first 500 mm: ∫ε dT / ΔT × length.
    const want = (500 * (enStainlessElongationIntegral(800) - enStainlessElongationIntegral(700))) / 100;
    expect(plan[1].movementMm).toBeCloseTo(want, 1);
    expect(movementWords(plan[1], (mm) => `${mm.toFixed(1)} mm`)).toBe(`Let it slide ${want.toFixed(1)} mm towards the run’s end`);
    expect(plan[0].movementMm).toBe(0);
  });

  it('when two runs share a fixing, then it is listed once', () => {
    const plan = checkSystem([run({ endFixing: 'sliding_bracket', joint: { type: 'flex', atMm: 500 } }), run({ startFixing: 'sliding_bracket', endFixing: 'free_end' })], DEFAULT_SYSTEM_BASIS).supports;
    expect(plan.filter((s) => s.label === 'Sliding bracket')).toHaveLength(1);
  });
});

describe('hot clearance to nearby items', () => {
  const hot = { startFixing: 'turbo_outlet', endFixing: 'free_end', segments: [{ lengthMm: 600, startTempC: 850, endTempC: 750 }], supports: [{ kind: 'hanger', atMm: 200 }] } as Partial<RunFields>;

  it('when a fuel line sits 20 mm from the hot end, then it is flagged with the fire caution and the shield-or-reroute advice', () => {
    const r = run({ ...hot, nearby: [{ kind: 'fuel_line', label: 'Feed line', atMm: 30, coldGapMm: 20, direction: 'beside' }] });
    const check = checkSystem([r], DEFAULT_SYSTEM_BASIS);
    const item = check.nearby[0];
    // Radial swell: half the OD's growth at the temperature there (EN Annex C law at ~845 °C).
    const swell = (76.2 / 2) * enStainlessElongation(item.tempC);
    expect(item.hotGapMm).toBeCloseTo(20 - swell, 1);
    expect(item.ok).toBe(false);
    expect(item.minimumMm).toBe(150);
    const f = check.findings.find((x) => x.code === 'NEARBY_TOO_CLOSE');
    expect(wordPhrase(f?.message ?? '', 'metric')).toMatch(/fit a heat shield or reroute it\. Fuel and brake lines near a hot exhaust skin are a fire risk/);
  });

  it('when an item lies in line with the pipe’s free end, then the gap closes by the whole growth', () => {
    const r = run({ ...hot, nearby: [{ kind: 'rubber', label: 'Bumper mount', atMm: 600, coldGapMm: 120, direction: 'in_line' }] });
    const growth = (600 * (enStainlessElongationIntegral(850) - enStainlessElongationIntegral(750))) / 100;
    const item = checkSystem([r], DEFAULT_SYSTEM_BASIS).nearby[0];
    expect(item.closingMm).toBeCloseTo(growth, 1);
    expect(item.ok).toBe(true);
  });
});
