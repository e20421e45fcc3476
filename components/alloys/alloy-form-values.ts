import type { AlloyInput, AlloyInputDraft, AlloyVersionView } from '../../shared/schemas/alloy';

/** The editable part of a version, as the form and PATCH take it. */
export function toFormValues(v: AlloyVersionView): AlloyInput {
  const { versionId: _id, version: _n, state: _s, createdAt: _ca, createdBy: _cb, publishedAt: _pa, publishedBy: _pb, ...input } = v;
  // Copies, so that editing the form never touches the cached version.
  return structuredClone(input);
}

const today = () => new Date().toISOString().slice(0, 10);

/** A new alloy starts with two empty expansion rows: the schema asks for at least two. */
export function emptyAlloy(): AlloyInputDraft {
  return {
    designation: '',
    uns: '',
    family: undefined as unknown as AlloyInput['family'],
    densityKgM3: Number.NaN,
    densitySourceId: '',
    maxContinuousC: Number.NaN,
    maxIntermittentC: Number.NaN,
    limitsSourceId: '',
    pricePerKg: Number.NaN,
    currency: 'EUR',
    priceSetOn: today(),
    priceIsDemo: false,
    referenceTempC: 20,
    notes: '',
    dataCautions: '',
    warningRanges: [],
    cte: [
      { tempC: 100, meanUmPerMK: Number.NaN, sourceId: '' },
      { tempC: 500, meanUmPerMK: Number.NaN, sourceId: '' },
    ],
    modulus: [],
    yield: [],
  };
}
