import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

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
  @Column('real', { name: 'max_temp_c' }) maxTempC: number;
  @Column('real') price: number;
  @Column('varchar') currency: string;
  @Column('boolean', { default: true }) active: boolean;
  @Column('boolean', { name: 'is_demo', default: false }) isDemo: boolean;
  @CreateDateColumn({ name: 'created_at', type: 'datetime' }) createdAt: Date;
  @UpdateDateColumn({ name: 'updated_at', type: 'datetime' }) updatedAt: Date;
}
