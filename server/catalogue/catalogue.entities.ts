import { Column, CreateDateColumn, Entity, Index, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { AlloyFamily, AlloyStatus, ReviewStep, RevisionAction } from '../../shared/schemas/alloy';
import { columnType } from '../db/column-types';

@Entity({ name: 'source' })
export class Source {
  @PrimaryColumn('varchar') id: string;
  /** Stable handle for seeded sources and CSV files; null for sources added by hand. */
  @Column('varchar', { nullable: true, unique: true }) key: string | null;
  @Column('varchar') kind: 'standard' | 'handbook' | 'datasheet' | 'memory';
  @Column('varchar') title: string;
  @Column('varchar', { default: '' }) issuer: string;
  @Column('varchar', { default: '' }) edition: string;
  @Column('varchar', { nullable: true }) url: string | null;
  @Column('varchar', { default: '' }) note: string;
  @Column('varchar', { name: 'datasheet_id', nullable: true }) datasheetId: string | null;
  @CreateDateColumn({ name: 'created_at', type: columnType.time }) createdAt: Date;
}

@Entity({ name: 'alloy' })
export class Alloy {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { unique: true }) uns: string;
  @Column('varchar') status: AlloyStatus;
  @Column('varchar', { name: 'published_version_id', nullable: true }) publishedVersionId: string | null;
  @Column('varchar', { name: 'draft_version_id', nullable: true }) draftVersionId: string | null;
  /** The open draft's place in review: submitted by an editor, or sent back by an admin; null otherwise. */
  @Column('varchar', { name: 'review_step', nullable: true }) reviewStep: ReviewStep | null;
  @Column('text', { name: 'review_note', default: '' }) reviewNote: string;
  @Column('varchar', { name: 'review_by', nullable: true }) reviewBy: string | null;
  @Column({ type: columnType.time, name: 'review_at', nullable: true }) reviewAt: Date | null;
  @CreateDateColumn({ name: 'created_at', type: columnType.time }) createdAt: Date;
  @UpdateDateColumn({ name: 'updated_at', type: columnType.time }) updatedAt: Date;
}

export interface WarningRange {
  fromC: number;
  toC: number;
  code: string;
  message: string;
}

@Entity({ name: 'alloy_version' })
@Index(['alloyId', 'version'], { unique: true })
export class AlloyVersion {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'alloy_id' }) alloyId: string;
  @Column('integer') version: number;
  @Column('varchar') state: 'draft' | 'published' | 'superseded';
  @Column('varchar') designation: string;
  /** `designationKey(designation)`: what the list sorts by. */
  @Column('varchar', { name: 'designation_key', default: '' }) designationKey: string;
  /** `searchText(designation, uns)`: what the list searches. */
  @Column('varchar', { name: 'search_text', default: '' }) searchText: string;
  @Column('varchar') uns: string;
  @Column('varchar') family: AlloyFamily;
  @Column(columnType.real, { name: 'density_kg_m3' }) densityKgM3: number;
  @Column('varchar', { name: 'density_source_id' }) densitySourceId: string;
  @Column(columnType.real, { name: 'max_continuous_c' }) maxContinuousC: number;
  @Column(columnType.real, { name: 'max_intermittent_c' }) maxIntermittentC: number;
  @Column('varchar', { name: 'limits_source_id' }) limitsSourceId: string;
  @Column(columnType.real, { name: 'price_per_kg' }) pricePerKg: number;
  @Column('varchar') currency: string;
  @Column('varchar', { name: 'price_set_on' }) priceSetOn: string;
  @Column(columnType.flag, { name: 'price_is_demo', default: false }) priceIsDemo: boolean;
  @Column(columnType.real, { name: 'reference_temp_c' }) referenceTempC: number;
  @Column('text', { default: '' }) notes: string;
  @Column('text', { name: 'data_cautions', default: '' }) dataCautions: string;
  @Column('simple-json', { name: 'warning_ranges' }) warningRanges: WarningRange[];
  @Column('varchar', { name: 'created_by', nullable: true }) createdBy: string | null;
  @CreateDateColumn({ name: 'created_at', type: columnType.time }) createdAt: Date;
  @Column('varchar', { name: 'published_by', nullable: true }) publishedBy: string | null;
  @Column(columnType.time, { name: 'published_at', nullable: true }) publishedAt: Date | null;
}

export type PropertyKind = 'cte' | 'modulus' | 'yield';

@Entity({ name: 'property_point' })
@Index(['versionId', 'kind', 'tempC'], { unique: true })
export class PropertyPoint {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'version_id' }) versionId: string;
  @Column('varchar') kind: PropertyKind;
  @Column(columnType.real, { name: 'temp_c' }) tempC: number;
  /** µm/m·K for cte, GPa for modulus, MPa for yield. */
  @Column(columnType.real) value: number;
  @Column('varchar', { name: 'source_id' }) sourceId: string;
}

@Entity({ name: 'alloy_revision' })
export class AlloyRevision {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'alloy_id' }) alloyId: string;
  @Column('integer', { nullable: true }) version: number | null;
  @Column('varchar') action: RevisionAction;
  @Column('varchar', { name: 'user_id', nullable: true }) userId: string | null;
  @Column('varchar', { name: 'user_name', nullable: true }) userName: string | null;
  @Column('varchar', { default: '' }) note: string;
  @Column('simple-json') diff: { path: string; before: unknown; after: unknown }[];
  @Column(columnType.time) at: Date;
}

@Entity({ name: 'datasheet' })
export class Datasheet {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'alloy_id' }) alloyId: string;
  @Column('varchar', { name: 'original_name' }) originalName: string;
  @Column('varchar', { name: 'stored_name', unique: true }) storedName: string;
  @Column('integer', { name: 'size_bytes' }) sizeBytes: number;
  @Column('varchar') sha256: string;
  @Column('varchar', { name: 'uploaded_by', nullable: true }) uploadedBy: string | null;
  @CreateDateColumn({ name: 'uploaded_at', type: columnType.time }) uploadedAt: Date;
}
