import { wordFieldMessage } from '../../shared/field-messages';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '../../constants/theme';
import { fixedPointLabel } from '../../shared/jobs/fixed-points';
import type { JobDetail, RunView } from '../../shared/schemas/jobs';
import { type UnitSystem, wallMmToGauge, wordPhrase } from '../../shared/units';
import { CautionsNote } from '../ui/cautions-note';
import { Text } from '../ui/text';
import { show, showMoney } from '../units/format';
import { runLength, runPeak } from './run-card';
import { runVerdicts } from './run-verdict';
import { SystemSection } from './system-section';
import { WeldPlanSection } from '../welds/weld-plan-section';
import { cutLengths } from '../../shared/jobs/cut-lengths';
import { stressFigure } from '../../shared/jobs/stress-figure';
import { presetWords } from '../runs/flex-section';
import { stressLine } from '../runs/restraint-words';

function Row({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.row} role="group" aria-label={label}>
      <Text variant="label" style={styles.rowLabel}>
        {label}
      </Text>
      <Text style={styles.rowValue}>{value}</Text>
    </View>
  );
}

function jointLine(run: RunView, units: UnitSystem): string {
  const j = run.joint;
  const r = run.result;
  if (j.type === 'none') return 'None';
  if (j.type === 'flex') {
    const chosen = r?.flex?.chosen;
    if (!chosen || !chosen.fits || chosen.presetMm === null) return r?.flex?.noneFitsReason ? wordPhrase(r.flex.noneFitsReason, units) : 'Flex section: no part fits';
    const at = j.atMm === undefined ? '' : `, centred ${show('length', j.atMm, units)} from the start`;
    return `Flex section ${chosen.name}${at}. ${presetWords(chosen.presetMm, units)}`;
  }
  const s = r?.slip;
  const failing = s?.checks.filter((c) => !c.ok).map((c) => wordPhrase(c.message, units)) ?? [];
  const verdict = !s ? 'not worked out' : failing.length === 0 ? 'every check passes' : `needs changes: ${failing.join('; ')}`;
  return `Slip joint: engage ${show('length', j.coldEngagementMm, units)}, leave a ${show('length', j.coldAxialGapMm, units)} gap, clearance ${show(
    'smallLength',
    j.coldClearanceMm,
    units,
  )} on the diameter (${verdict})`;
}

function cutLine(run: RunView, units: UnitSystem): string {
  const cut = cutLengths(runLength(run), run.joint, run.result);
  const pieces = cut.pieces && cut.pieces.length > 1 ? `${cut.pieces.map((p) => show('length', p, units)).join(' + ')} = ` : '';
  const note = cut.note ? ` (${wordPhrase(cut.note, units)})` : '';
  return `${pieces}${show('length', cut.totalMm, units)}${note}`;
}

function SheetRun({ run, units }: { run: RunView; units: UnitSystem }) {
  const gauge = wallMmToGauge(run.tube.wallMm);
  const alloy = run.alloy ? `${run.alloy.designation}, UNS ${run.alloy.uns}, data version ${run.alloy.version}` : 'Unknown alloy';
  const temps = run.segments.map((s) => `${show('temperature', s.startTempC, units)} → ${show('temperature', s.endTempC, units)}`).join('; ');
  return (
    <View style={styles.run} role="article" aria-label={`Run ${run.position}: ${run.name}`}>
      <Text variant="bodyStrong">
        {run.position}. {run.name}
      </Text>
      <Row label="Alloy" value={alloy} />
      <Row label="Tube" value={`${show('length', run.tube.odMm, units)} OD × ${show('smallLength', run.tube.wallMm, units)} wall${gauge === null ? '' : ` (${gauge} ga)`}`} />
      <Row label="Tube to cut" value={cutLine(run, units)} />
      <Row label="Ends" value={`${fixedPointLabel(run.startFixing)} to ${fixedPointLabel(run.endFixing)}`} />
      <Row label="Temperatures" value={`install ${show('temperature', run.installTempC, units)}; ${temps}; peak ${show('temperature', runPeak(run), units)}`} />
      <Row label="Growth" value={run.result ? show('smallLength', run.result.growthMm, units) : (run.problem ? wordFieldMessage(run.problem.message, units) : '—')} />
      <Row label="Joint" value={jointLine(run, units)} />
      {run.result ? <Row label="Stress if nothing gave" value={stressLine(stressFigure(run.result.restraint), units)} /> : null}
      <Row label="Verdict" value={runVerdicts(run).map((v) => v.label).join(', ') || '—'} />
      {run.notes ? <Row label="Notes" value={run.notes} /> : null}
    </View>
  );
}

/** One job for the bench: every run's material, cuts, temperatures, growth and joint, with the cautions. */
export function JobSheet({ job, units }: { job: JobDetail; units: UnitSystem }) {
  const t = job.totals;
  return (
    <View style={styles.sheet}>
      <View style={styles.head}>
        <Text variant="overline" tone="muted">
          Dilato job sheet
        </Text>
        <Text variant="title" headingLevel={1}>
          {job.name}
        </Text>
        <Text>
          {job.customer} · {job.application}
        </Text>
        <Text variant="caption" tone="muted">
          Printed {new Date().toLocaleDateString('en-GB', { dateStyle: 'medium' })}. Units: {units === 'metric' ? 'mm, °C, kg' : 'in, °F, lb'}.
        </Text>
      </View>
      <View style={styles.totals} role="group" aria-label="System totals">
        <Row label="Runs" value={String(t.runCount)} />
        <Row label="Total growth" value={show('smallLength', t.growthMm, units)} />
        <Row label="Total tube length" value={show('length', t.lengthMm, units)} />
        <Row label="Total mass" value={show('mass', t.massKg, units)} />
        <Row label="Material cost" value={showMoney(t.materialCost, t.currency)} />
      </View>
      {job.runs.length === 0 ? <Text tone="muted">This job has no runs yet.</Text> : null}
      {job.runs.map((run) => (
        <SheetRun key={run.id} run={run} units={units} />
      ))}
      <SystemSection job={job} units={units} />
      {job.runs.length > 0 ? <WeldPlanSection jobId={job.id} /> : null}
      <CautionsNote />
    </View>
  );
}

const styles = StyleSheet.create({
  sheet: { gap: spacing.lg },
  head: { gap: spacing.xxs },
  totals: { gap: spacing.xxs, padding: spacing.md, borderWidth: 1, borderColor: colors.borderStrong, borderRadius: radii.md },
  run: { gap: spacing.xxs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surfaceRaised },
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md },
  rowLabel: { minWidth: 120 },
  rowValue: { flex: 1, minWidth: 200 },
});
