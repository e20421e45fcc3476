import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { SlipResult, SlipState } from '../../shared/engine/types';
import type { UnitSystem } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { show } from '../units/format';
import { BasisNotes, CheckList } from './joint-notes';

const STATE_TITLES: Record<SlipState['state'], string> = { install: 'At install', hot: 'Hot', cold: 'At the coldest start' };

function ClearanceRow({ s, units }: { s: SlipState; units: UnitSystem }) {
  const mm = (x: number) => show('smallLength', x, units, units === 'metric' ? 3 : 4);
  const temps = s.innerTempC === s.outerTempC ? show('temperature', s.innerTempC, units) : `spigot ${show('temperature', s.innerTempC, units)}, sleeve ${show('temperature', s.outerTempC, units)}`;
  return (
    <View role="listitem" aria-label={`Radial clearance ${STATE_TITLES[s.state].toLowerCase()}`}>
      <Text>
        <Text variant="bodyStrong">
          {STATE_TITLES[s.state]} ({temps}):
        </Text>{' '}
        tightest {mm(s.tightestRadialMm)}, nominal {mm(s.nominalRadialMm)}, loosest {mm(s.loosestRadialMm)}
      </Text>
    </View>
  );
}

/** The slip joint's fit with its allowances, hot and at the coldest start, and its axial room. */
export function SlipSection({ slip, units }: { slip: SlipResult; units: UnitSystem }) {
  const fine = (x: number) => show('smallLength', x, units, units === 'metric' ? 3 : 4);
  return (
    <Section title="Slip joint">
      <Text tone={slip.verdict === 'ok' ? 'success' : 'danger'} variant="bodyStrong">
        {slip.verdict === 'ok' ? 'Slides and has room: every check passes.' : 'Needs changes before it is built: see the checks.'}
      </Text>
      <CheckList checks={slip.checks} label="Slip joint checks" units={units} />
      <Text variant="label">Radial clearance (on one side)</Text>
      <View role="list" aria-label="Radial clearance by state" style={styles.list}>
        {slip.states.map((s) => (
          <ClearanceRow key={s.state} s={s} units={units} />
        ))}
      </View>
      <View style={styles.facts}>
        <Fact label="Allowed radial clearance" value={`${fine(slip.minRadialClearanceMm)} to ${fine(slip.maxRadialClearanceMm)}`} />
        <Fact label="Diameter tolerance" value={`± ${fine(slip.toleranceMm)}`} />
        <Fact label="Scale per surface" value={fine(slip.scalePerSurfaceMm)} />
        <Fact label="Hot closure" value={show('smallLength', slip.hotClosureMm, units)} />
        <Fact label="Gap needed" value={show('smallLength', slip.requiredGapMm, units)} />
        <Fact label="Draw-out at the coldest start" value={show('smallLength', slip.coldDrawOutMm, units)} />
        <Fact label="Engagement at the coldest start" value={show('length', slip.coldestEngagementMm, units)} />
        <Fact label="Minimum engagement" value={show('length', slip.minEngagementMm, units)} />
      </View>
      <BasisNotes
        notes={[slip.toleranceNote, slip.scaleNote, slip.clearanceLimitsNote, slip.minEngagementNote]}
        simplified="Simplified check of the fit and the axial room, with no leak-rate, wear or pressure analysis. Measure the sized parts before welding, and support the run on both sides of the joint so it slides straight."
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  list: { gap: spacing.xxs },
});
