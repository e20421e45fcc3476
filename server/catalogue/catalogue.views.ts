import type { AlloyVersionView, DatasheetView, RevisionView, SourceView } from '../../shared/schemas/alloy';
import type { AlloyRevision, AlloyVersion, Datasheet, PropertyPoint, Source } from './catalogue.entities';

export function versionView(v: AlloyVersion, points: PropertyPoint[]): AlloyVersionView {
  const mine = points.filter((p) => p.versionId === v.id).sort((a, b) => a.tempC - b.tempC);
  const of = (kind: PropertyPoint['kind']) => mine.filter((p) => p.kind === kind);
  return {
    versionId: v.id,
    version: v.version,
    state: v.state,
    designation: v.designation,
    uns: v.uns,
    family: v.family,
    densityKgM3: v.densityKgM3,
    densitySourceId: v.densitySourceId,
    maxContinuousC: v.maxContinuousC,
    maxIntermittentC: v.maxIntermittentC,
    limitsSourceId: v.limitsSourceId,
    pricePerKg: v.pricePerKg,
    currency: v.currency,
    priceSetOn: v.priceSetOn,
    priceIsDemo: Boolean(v.priceIsDemo),
    referenceTempC: v.referenceTempC,
    notes: v.notes,
    dataCautions: v.dataCautions ?? '',
    warningRanges: v.warningRanges ?? [],
    cte: of('cte').map((p) => ({ tempC: p.tempC, meanUmPerMK: p.value, sourceId: p.sourceId })),
    modulus: of('modulus').map((p) => ({ tempC: p.tempC, gpa: p.value, sourceId: p.sourceId })),
    yield: of('yield').map((p) => ({ tempC: p.tempC, mpa: p.value, sourceId: p.sourceId })),
    createdAt: new Date(v.createdAt).toISOString(),
    createdBy: v.createdBy,
    publishedAt: v.publishedAt ? new Date(v.publishedAt).toISOString() : null,
    publishedBy: v.publishedBy,
  };
}

export function sourceView(s: Source): SourceView {
  return {
    id: s.id,
    key: s.key,
    kind: s.kind,
    title: s.title,
    issuer: s.issuer,
    edition: s.edition,
    url: s.url,
    note: s.note,
    datasheetId: s.datasheetId,
  };
}

export function datasheetView(d: Datasheet): DatasheetView {
  return {
    id: d.id,
    originalName: d.originalName,
    sizeBytes: d.sizeBytes,
    sha256: d.sha256,
    uploadedBy: d.uploadedBy,
    uploadedAt: new Date(d.uploadedAt).toISOString(),
  };
}

export function revisionView(r: AlloyRevision): RevisionView {
  return {
    id: r.id,
    action: r.action,
    version: r.version,
    at: new Date(r.at).toISOString(),
    by: r.userName,
    note: r.note,
    diff: r.diff,
  };
}

/** Every source a version cites. */
export function citedSourceIds(v: AlloyVersionView): string[] {
  return [
    v.densitySourceId,
    v.limitsSourceId,
    ...v.cte.map((p) => p.sourceId),
    ...v.modulus.map((p) => p.sourceId),
    ...v.yield.map((p) => p.sourceId),
  ];
}
