import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { movementWords } from '../../shared/jobs/support-plan';
import type { JobDetail } from '../../shared/schemas/jobs';
import { type UnitSystem, wordPhrase } from '../../shared/units';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { SystemDrawing } from './system-drawing';

/** The job as one system: the drawing, what is wrong with it, where it is supported and how far each support lets it move, the hot gaps. */
export function SystemSection({ job, units }: { job: JobDetail; units: UnitSystem }) {
  const s = job.system;
  const mm = (x: number) => show('smallLength', x, units);
  if (job.runs.length === 0) return null;
  return (
    <Section title="The system" intro="Runs in build order, coloured by pipe temperature, with their fixings, supports, joints and what sits near them.">
      <SystemDrawing job={job} units={units} />
      <Text variant="label">Checks</Text>
      {s.findings.length === 0 ? (
        <Text tone="success">Every stretch between held points has a joint, every joint has supports beside it, nothing hangs on an engine flange, and every listed item keeps its hot gap.</Text>
      ) : (
        <View role="list" aria-label="System checks" style={styles.list}>
          {s.findings.map((f, i) => (
            <View role="listitem" key={`${f.code}-${i}`}>
              <Text tone={f.severity === 'danger' ? 'danger' : 'warning'}>{wordPhrase(f.message, units)}.</Text>
            </View>
          ))}
        </View>
      )}
      <Text variant="label">Support plan</Text>
      {s.supports.length === 0 ? (
        <Text tone="muted">No supports or held ends yet.</Text>
      ) : (
        <View role="list" aria-label="Support plan" style={styles.list}>
          {s.supports.map((p, i) => (
            <View role="listitem" key={`${p.runId}-${i}`}>
              <Text>
                <Text variant="bodyStrong">{p.label}</Text>, {p.runName} at {show('length', p.atMm, units)}
                {p.sharedWith ? ` (shared with ${p.sharedWith})` : ''}: {movementWords(p, mm)}
              </Text>
            </View>
          ))}
        </View>
      )}
      {s.nearby.length > 0 ? (
        <>
          <Text variant="label">Hot clearance</Text>
          <View role="list" aria-label="Hot clearance" style={styles.list}>
            {s.nearby.map((n) => (
              <View role="listitem" key={`${n.runId}-${n.index}`}>
                <Text tone={n.ok ? 'success' : 'danger'}>
                  {n.index + 1}. {n.runName}: {wordPhrase(n.message, units)}.
                </Text>
              </View>
            ))}
          </View>
        </>
      ) : null}
      <View style={styles.list}>
        {s.basisNotes.map((note) => (
          <Text key={note} variant="caption" tone="muted">
            {note}.
          </Text>
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.xs },
});
