import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { FlexCandidateResult, FlexResult, FlexStateUse } from '../../shared/engine/types';
import { type UnitSystem, wordPhrase } from '../../shared/units';
import { Fact } from '../ui/fact';
import { Section } from '../ui/section';
import { Text } from '../ui/text';
import { show, showSigned } from '../units/format';
import { BasisNotes } from './joint-notes';

const pct = (x: number) => `${Math.round(x * 100)} %`;
const STATE_NAMES: Record<FlexStateUse['state'], string> = { install: 'at install', hot: 'hot', cold: 'at the coldest start' };

/** "Stretch it 3.6 mm at install" / "Compress it 0.4 mm at install" / "Fit it at its free length". */
export function presetWords(presetMm: number, units: UnitSystem): string {
  if (presetMm === 0) return 'Fit it at its free length';
  return presetMm > 0 ? `Stretch it ${show('smallLength', presetMm, units)} at install` : `Compress it ${show('smallLength', -presetMm, units)} at install`;
}

function usesLine(c: FlexCandidateResult, share: number): string {
  const worst = (key: 'compressionUse' | 'extensionUse') => c.uses.reduce((a, u) => (u[key] > a[key] ? u : a), c.uses[0]);
  const comp = worst('compressionUse');
  const ext = worst('extensionUse');
  return `Uses ${pct(comp.compressionUse)} of its rated compression (${STATE_NAMES[comp.state]}), ${pct(ext.extensionUse)} of its rated extension (${STATE_NAMES[ext.state]}), ${pct(c.lateralUse)} of its lateral and ${pct(c.angularUse)} of its angular rating; at most ${pct(share)} of each`;
}

/** The flex part the run uses, its one pre-set, and how much of each rating it takes. */
export function FlexSection({ flex, units }: { flex: FlexResult; units: UnitSystem }) {
  const hot = flex.states.find((s) => s.state === 'hot')!;
  const cold = flex.states.find((s) => s.state === 'cold')!;
  const chosen = flex.chosen;
  return (
    <Section title="Flex section">
      <View style={styles.facts}>
        <Fact label="Hot growth" value={show('smallLength', hot.axialGrowthMm, units)} />
        <Fact label={`At the coldest start (${show('temperature', flex.coldestAmbientC, units)})`} value={showSigned('smallLength', cold.axialGrowthMm, units)} />
        <Fact label="Axial range" value={show('smallLength', flex.axialRangeMm, units)} />
        <Fact label="Lateral offset, hot" value={show('smallLength', hot.lateralMm, units)} />
        <Fact label="Rotation, hot" value={`${hot.rotationDeg.toFixed(1)}°`} />
        <Fact label={flex.tempBasis === 'location' ? 'Temperature at the flex' : 'Judged at the run peak'} value={show('temperature', flex.tempAtFlexC, units)} />
      </View>
      {chosen ? (
        <View style={styles.chosen} role="group" aria-label="Chosen flex part">
          <Text variant="bodyStrong" tone={chosen.fits ? 'success' : 'danger'}>
            {chosen.fits ? 'Fits' : 'Does not fit'}: {chosen.name} ({flex.chosenBy === 'fabricator' ? 'your pick' : 'picked by Dilato'})
          </Text>
          {chosen.fits && chosen.presetMm !== null ? (
            <View role="group" aria-label="Pre-set">
              <Text variant="heading">{presetWords(chosen.presetMm, units)}</Text>
            </View>
          ) : null}
          {chosen.fits ? <Text>{usesLine(chosen, flex.travelShare)}.</Text> : null}
          {chosen.reasons.map((r, i) => (
            <Text key={i} tone="danger">
              {wordPhrase(r, units)}.
            </Text>
          ))}
          {chosen.warnings.map((w) => (
            <Text key={w.code} tone="warning">
              {wordPhrase(w.message, units)}.
            </Text>
          ))}
        </View>
      ) : (
        <Text tone="danger" variant="bodyStrong">
          {flex.noneFitsReason ? wordPhrase(flex.noneFitsReason, units) : 'No flex part in the catalogue fits this run.'}
        </Text>
      )}
      <BasisNotes
        notes={[
          flex.travelShareNote,
          flex.relationNote,
          ...(chosen?.meanDiameterEstimated ? ['The part has no mean diameter on record: it is estimated as 1.15 × bore, which overstates the lateral and angular share'] : []),
          ...(flex.heatCycles === null ? ['No heat cycles entered for this run: the part’s cycle rating is not checked'] : []),
        ]}
        simplified="Simplified check of movements against the part maker’s ratings, with no pressure, spring-force or fatigue analysis. The part maker’s rating and instructions govern: support both sides of the flex, and never let it carry weight or take up misalignment."
      />
    </Section>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  chosen: { gap: spacing.xs },
});
