import { randomUUID } from 'node:crypto';
import type { FlexPart } from '../../shared/engine/types';
import type { FlexPartInput, FlexPartView } from '../../shared/schemas/alloy';
import { toSizingPart } from '../../shared/catalogue/flex-sizing-part';
import { StampedCache } from '../cache/stamped-cache';
import { AppError } from '../http/app-error';
import type { FlexPartRow } from './flex-part.entity';
import type { FlexPartsRepository } from './flex-parts.repository';

function view(row: FlexPartRow): FlexPartView {
  return {
    id: row.id,
    code: row.code,
    name: row.name,
    boreMm: row.boreMm,
    liveLengthMm: row.liveLengthMm,
    ratedAxialCompressionMm: row.ratedAxialCompressionMm,
    ratedAxialExtensionMm: row.ratedAxialExtensionMm,
    lateralOffsetMm: row.lateralOffsetMm,
    purpose: row.purpose,
    overallLengthMm: row.overallLengthMm,
    meanDiameterMm: row.meanDiameterMm,
    ratedAngularDeg: row.ratedAngularDeg,
    ratedCycles: row.ratedCycles,
    maxTempC: row.maxTempC,
    price: row.price,
    currency: row.currency,
    cuffUns: row.cuffUns ?? null,
    active: Boolean(row.active),
    isDemo: Boolean(row.isDemo),
  };
}

export class FlexPartsService {
  private readonly sizing = new StampedCache<FlexPart[]>(1);

  constructor(private readonly repo: FlexPartsRepository) {}

  async list(includeInactive: boolean): Promise<FlexPartView[]> {
    return (await this.repo.list(!includeInactive)).map(view);
  }

  /** The active parts, as the calculator's flex sizing reads them; cached while the parts' stamp stands. */
  async forSizing(): Promise<FlexPart[]> {
    return (await this.forSizingStamped()).parts;
  }

  /** The active parts with the stamp they stand for, for caches of results that used them. */
  async forSizingStamped(): Promise<{ stamp: number; parts: FlexPart[] }> {
    const stamp = await this.repo.stamp();
    return { stamp, parts: await this.sizing.get(stamp, 'active', async () => (await this.list(false)).map(toSizingPart)) };
  }

  async create(input: FlexPartInput, isDemo = false): Promise<FlexPartView> {
    if (await this.repo.findByCode(input.code)) {
      throw AppError.conflict('code_taken', 'A flex part with this code already exists.', { code: 'This code is taken' });
    }
    return view(await this.repo.save(this.repo.create({ id: randomUUID(), ...input, isDemo })));
  }

  async update(id: string, input: Partial<FlexPartInput>): Promise<FlexPartView> {
    const row = await this.repo.findById(id);
    if (!row) throw AppError.notFound('There is no such flex part.');
    if (input.code && input.code !== row.code && (await this.repo.findByCode(input.code))) {
      throw AppError.conflict('code_taken', 'A flex part with this code already exists.', { code: 'This code is taken' });
    }
    Object.assign(row, input);
    return view(await this.repo.save(row));
  }
}
