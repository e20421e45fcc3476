import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import type { FlexPurpose } from '../../shared/engine/types';

@Entity({ name: 'flex_part' })
export class FlexPartRow {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { unique: true }) code: string;
  @Column('varchar') name: string;
  @Column('real', { name: 'bore_mm' }) boreMm: number;
  @Column('real', { name: 'live_length_mm' }) liveLengthMm: number;
  @Column('real', { name: 'rated_axial_compression_mm' }) ratedAxialCompressionMm: number;
  @Column('real', { name: 'rated_axial_extension_mm' }) ratedAxialExtensionMm: number;
  @Column('real', { name: 'lateral_offset_mm' }) lateralOffsetMm: number;
  @Column('varchar', { default: 'thermal_bellows' }) purpose: FlexPurpose;
  @Column('real', { name: 'overall_length_mm', nullable: true }) overallLengthMm: number | null;
  @Column('real', { name: 'mean_diameter_mm', nullable: true }) meanDiameterMm: number | null;
  @Column('real', { name: 'rated_angular_deg', default: 0 }) ratedAngularDeg: number;
  @Column('integer', { name: 'rated_cycles', nullable: true }) ratedCycles: number | null;
  @Column('real', { name: 'max_temp_c' }) maxTempC: number;
  @Column('real') price: number;
  @Column('varchar') currency: string;
  @Column('varchar', { name: 'cuff_uns', nullable: true }) cuffUns: string | null;
  @Column('boolean', { default: true }) active: boolean;
  @Column('boolean', { name: 'is_demo', default: false }) isDemo: boolean;
  @CreateDateColumn({ name: 'created_at', type: 'datetime' }) createdAt: Date;
  @UpdateDateColumn({ name: 'updated_at', type: 'datetime' }) updatedAt: Date;
}
