import { calcRunRequestSchema, fieldsFromZodError, toRunInput } from '../../shared/schemas/calc';

// The example body of issue 3.
const example = () => ({
  alloy: {
    referenceTempC: 20,
    cte: [{ tempC: 100, meanUmPerMK: 16.5 }],
    modulus: [{ tempC: 20, gpa: 193 }],
    yield: [{ tempC: 20, mpa: 205 }],
    densityKgM3: 8000,
    maxContinuousC: 925,
    maxIntermittentC: 870,
    pricePerKg: 5.2,
  } as Record<string, unknown>,
  tube: { odMm: 76.2, wallMm: 1.65 },
  installTempC: 20,
  segments: [{ lengthMm: 600, startTempC: 880, endTempC: 790 }] as Record<string, unknown>[],
}) as Record<string, unknown> & { segments: Record<string, unknown>[] };

function fieldsOf(body: unknown): Record<string, string> {
  const r = calcRunRequestSchema.safeParse(body);
  if (r.success) throw new Error('expected a refusal');
  return fieldsFromZodError(r.error);
}

describe('POST /api/calc/run body', () => {
  it('when the issue 3 example is sent, then it parses and is a valid engine input', () => {
    const r = calcRunRequestSchema.safeParse(example());
    expect(r.success).toBe(true);
    if (r.success) expect(toRunInput(r.data).segments).toHaveLength(1);
  });

  it('when alloyId is given instead of inline data, then it parses', () => {
    const { alloy: _drop, ...rest } = example();
    expect(calcRunRequestSchema.safeParse({ ...rest, alloyId: 'a-304' }).success).toBe(true);
  });

  it('when both or neither of alloyId and alloy are given, then it is refused on the alloy fields', () => {
    expect(fieldsOf({ ...example(), alloyId: 'a-304' })).toHaveProperty('alloy');
    const { alloy: _drop, ...rest } = example();
    expect(fieldsOf(rest)).toEqual({ alloyId: 'Choose an alloy or give its data' });
  });

  it('when a length is zero or negative, then the path is segments.N.lengthMm', () => {
    const body = example();
    body.segments = [{ lengthMm: 100, startTempC: 500, endTempC: 400 }, { lengthMm: 0, startTempC: 400, endTempC: 300 }, { lengthMm: -5, startTempC: 300, endTempC: 200 }];
    expect(fieldsOf(body)).toEqual({ 'segments.1.lengthMm': 'Length must be more than 0 mm', 'segments.2.lengthMm': 'Length must be more than 0 mm' });
  });

  it('when the wall is half the OD or more, then the path is tube.wallMm', () => {
    expect(fieldsOf({ ...example(), tube: { odMm: 50, wallMm: 25 } })).toEqual({ 'tube.wallMm': 'Wall must be less than half the outside diameter' });
  });

  it('when there are no segments, then the path is segments', () => {
    expect(fieldsOf({ ...example(), segments: [] })).toEqual({ segments: 'Add at least one segment' });
  });

  it('when a number arrives as a string or is missing, then it is refused as not a number', () => {
    const f = fieldsOf({ ...example(), installTempC: '20', tube: { odMm: 76.2 } });
    expect(f.installTempC).toBe('Enter a number');
    expect(f['tube.wallMm']).toBe('Enter a number');
  });

  it('when a temperature is below −50 °C, then it is refused with that path', () => {
    const body = example();
    body.segments[0].endTempC = -60;
    expect(Object.keys(fieldsOf(body))).toEqual(['segments.0.endTempC']);
  });

  it('when the inline alloy table does not rise, then the row is named', () => {
    const body = example();
    body.alloy = { ...(body.alloy as Record<string, unknown>), cte: [{ tempC: 200, meanUmPerMK: 17 }, { tempC: 100, meanUmPerMK: 16.5 }] };
    expect(fieldsOf(body)).toHaveProperty(['alloy.cte.1.tempC']);
  });

  it('when slip members give both an alloy id and data, then the member is refused; giving neither is the run alloy', () => {
    const slip = { inner: { tempC: 850 }, outer: { tempC: 700, alloyId: 'x', alloy: example().alloy }, coldClearanceMm: 0.2, coldEngagementMm: 80, coldAxialGapMm: 15 };
    expect(fieldsOf({ ...example(), slip })).toHaveProperty(['slip.outer.alloy']);
    expect(calcRunRequestSchema.safeParse({ ...example(), slip: { ...slip, outer: { tempC: 700 } } }).success).toBe(true);
  });

  it('when the flex position is beyond the run or a movement is negative, then the flex field is named', () => {
    expect(fieldsOf({ ...example(), flex: { atMm: 601 } })).toHaveProperty(['flex.atMm']);
    expect(fieldsOf({ ...example(), flex: { lateralOffsetMm: -1, rotationDeg: 50 } })).toEqual({
      'flex.lateralOffsetMm': 'Cannot be negative',
      'flex.rotationDeg': 'Rotation must be at most 45 °',
    });
    expect(fieldsOf({ ...example(), flex: { heatCycles: 2.5 } })).toHaveProperty(['flex.heatCycles']);
  });

  it('when a temperature is past what any pipework alloy survives, then it is refused with its path and nothing computes', () => {
    const body = example();
    body.segments[0].startTempC = 5000;
    expect(fieldsOf(body)).toEqual({ 'segments.0.startTempC': 'Above 1300 °C: no alloy for pipework holds together there' });
  });

  it('when lengths or sizes are absurd, then each is refused with its path (two 1e308 mm segments no longer pass)', () => {
    const body = example();
    body.segments = [
      { lengthMm: 1e308, startTempC: 500, endTempC: 400 },
      { lengthMm: 1e308, startTempC: 400, endTempC: 300 },
    ];
    expect(fieldsOf(body)).toEqual({ 'segments.0.lengthMm': 'A segment must be at most 50000 mm', 'segments.1.lengthMm': 'A segment must be at most 50000 mm' });
    expect(fieldsOf({ ...example(), tube: { odMm: 1e9, wallMm: 2 } })).toHaveProperty(['tube.odMm']);
  });

  it('when a slip joint’s clearance limits cross, then the maximum is named', () => {
    const slip = { inner: { tempC: 850 }, outer: { tempC: 700 }, coldClearanceMm: 0.2, coldEngagementMm: 80, coldAxialGapMm: 15, minRadialClearanceMm: 0.3, maxRadialClearanceMm: 0.2 };
    expect(fieldsOf({ ...example(), slip })).toEqual({ 'slip.maxRadialClearanceMm': 'The maximum must be above the minimum' });
  });

  it('when the alloy has no modulus or yield table, then the body still parses (the stress check says it is not in the data)', () => {
    const body = example();
    body.alloy = { ...(body.alloy as Record<string, unknown>), modulus: [], yield: [] };
    expect(calcRunRequestSchema.safeParse(body).success).toBe(true);
  });
});
