import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { columnType } from '../db/column-types';

/** One row of the shop's weld table: a pair of base-metal sets and what to weld them with. */
@Entity({ name: 'weld_rule' })
export class WeldRuleRow {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { nullable: true, unique: true }) key: string | null;
  @Column({ type: columnType.json, name: 'side_a', transformer: jsonList() }) sideA: string[];
  @Column({ type: columnType.json, name: 'side_b', transformer: jsonList() }) sideB: string[];
  @Column('varchar') filler: string;
  @Column('varchar', { name: 'filler_spec' }) fillerSpec: string;
  @Column('text') purge: string;
  @Column('text', { default: '' }) notes: string;
  @Column('varchar', { name: 'procedure_ref', default: '' }) procedureRef: string;
  @Column('text') source: string;
  @Column('integer') version: number;
  @Column('varchar', { name: 'updated_by', nullable: true }) updatedBy: string | null;
  @Column({ type: columnType.time, name: 'created_at' }) createdAt: Date;
  @Column({ type: columnType.time, name: 'updated_at' }) updatedAt: Date;
}

/** Every change to a weld rule, with a readable diff; kept after the rule is deleted. */
@Entity({ name: 'weld_rule_revision' })
@Index(['ruleId', 'version'])
export class WeldRuleRevision {
  @PrimaryColumn('varchar') id: string;
  @Column('varchar', { name: 'rule_id' }) ruleId: string;
  @Column('integer') version: number;
  @Column('varchar') action: 'created' | 'edited' | 'deleted';
  @Column('varchar', { name: 'user_id', nullable: true }) userId: string | null;
  @Column('varchar', { name: 'user_name', nullable: true }) userName: string | null;
  @Column('varchar', { default: '' }) note: string;
  @Column({ type: columnType.json, transformer: jsonList() }) diff: { path: string; before: unknown; after: unknown }[];
  @Column({ type: columnType.time }) at: Date;
}

function jsonList<T>() {
  return {
    to: (value: T[] | undefined) => (value === undefined ? undefined : JSON.stringify(value)),
    from: (value: string | null) => (value ? (JSON.parse(value) as T[]) : []),
  };
}
