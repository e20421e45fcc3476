import { useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import Svg, { Defs, G, LinearGradient, Rect, Stop, Text as SvgText } from 'react-native-svg';
import { drawing, fonts, spacing } from '../../constants/theme';
import { fixedPointLabel, fixedPointRole } from '../../shared/jobs/fixed-points';
import { jointPositionMm } from '../../shared/jobs/run-movement';
import type { PlannedSupport } from '../../shared/jobs/support-plan';
import type { JobDetail, RunView } from '../../shared/schemas/jobs';
import { show } from '../units/format';
import type { UnitSystem } from '../../shared/units';
import { heatColour } from './heat-colour';
import { FixingMark, HangerMark, JointMark, NearbyMark, PIPE_H, PIPE_Y, SlideMark } from './system-drawing-marks';
import { keyHeight, SymbolKey } from './system-drawing-key';

const ROW = 104;
const PAD = 28;
const LEGEND = 44;

type Mark = { x: number; label: string };

function RunRow({
  run,
  index,
  width,
  units,
  closeItems,
  supports,
}: {
  run: RunView;
  index: number;
  width: number;
  units: UnitSystem;
  closeItems: Set<string>;
  supports: PlannedSupport[];
}) {
  const length = run.segments.reduce((s, g) => s + g.lengthMm, 0);
  const x = (mm: number) => PAD + ((width - 2 * PAD) * Math.min(Math.max(mm, 0), length)) / length;
  const ends = run.segments.map((_, i) => run.segments.slice(0, i + 1).reduce((sum, g) => sum + g.lengthMm, 0));
  const segs = run.segments.map((g, i) => ({ from: ends[i] - g.lengthMm, to: ends[i], g }));
  const marks: Mark[] = [];
  const r = run.result;
  const joint = run.joint.type === 'none' ? null : jointPositionMm(run, length);
  if (r && run.joint.type !== 'none' && joint !== null)
    marks.push({
      x: x(joint),
      label: `↔ ${show('smallLength', r.growthMm, units)}`,
    });
  return (
    <G y={index * ROW}>
      <SvgText x={PAD - 18} y={16} fontSize={13} fontFamily={fonts.semibold} fill={drawing.text}>
        {`${run.position}. ${run.name}`}
      </SvgText>
      <SvgText x={PAD - 18} y={32} fontSize={11} fontFamily={fonts.regular} fill={drawing.textMuted}>
        {`${fixedPointLabel(run.startFixing)} → ${fixedPointLabel(run.endFixing)}`}
      </SvgText>
      <Defs>
        {segs.map((s, i) => (
          <LinearGradient key={i} id={`heat-${run.id}-${i}`} x1="0" y1="0" x2="1" y2="0">
            <Stop offset="0" stopColor={heatColour(s.g.startTempC)} />
            <Stop offset="1" stopColor={heatColour(s.g.endTempC)} />
          </LinearGradient>
        ))}
      </Defs>
      {segs.map((s, i) => (
        <Rect
          key={i}
          x={x(s.from)}
          y={PIPE_Y}
          width={Math.max(1, x(s.to) - x(s.from))}
          height={PIPE_H}
          fill={`url(#heat-${run.id}-${i})`}
          stroke={drawing.pipeOutline}
          strokeWidth={1}
        />
      ))}
      <FixingMark role={fixedPointRole(run.startFixing)} x={x(0)} />
      <FixingMark role={fixedPointRole(run.endFixing)} x={x(length)} />
      {run.supports.map((s, i) => (s.kind === 'sliding' ? <SlideMark key={i} x={x(s.atMm)} /> : <HangerMark key={i} x={x(s.atMm)} />))}
      {run.joint.type !== 'none' && joint !== null ? <JointMark type={run.joint.type} x={x(joint)} /> : null}
      {run.nearby.map((n, i) => {
        const close = closeItems.has(`${run.id}:${i}`);
        const cx = x(n.atMm);
        const cy = PIPE_Y + PIPE_H + 24;
        return (
          <G key={`n${i}`}>
            <NearbyMark cx={cx} cy={cy} close={close} />
            <SvgText x={cx + 9} y={cy + 4} fontSize={11} fontFamily={fonts.semibold} fill={close ? drawing.nearbyClose : drawing.nearbyOk}>
              {`${i + 1}`}
            </SvgText>
          </G>
        );
      })}
      {supports
        .filter((s) => s.role === 'slide' || s.role === 'hanger')
        .map((s, i) => (
          <SvgText key={`s${i}`} x={x(s.atMm)} y={PIPE_Y + PIPE_H + 44} fontSize={11} fontFamily={fonts.regular} fill={drawing.support} textAnchor="middle">
            {`${s.movementMm >= 0 ? '→' : '←'} ${show('smallLength', Math.abs(s.movementMm), units)}`}
          </SvgText>
        ))}
      {marks.map((m, i) => (
        <SvgText key={`m${i}`} x={m.x} y={PIPE_Y - 10} fontSize={11} fontFamily={fonts.semibold} fill={drawing.joint} textAnchor="middle">
          {m.label}
        </SvgText>
      ))}
    </G>
  );
}

function Legend({ y, width, minC, maxC, units }: { y: number; width: number; minC: number; maxC: number; units: UnitSystem }) {
  const stops = [0, 0.25, 0.5, 0.75, 1].map((t) => ({
    t,
    c: heatColour(minC + (maxC - minC) * t),
  }));
  return (
    <G y={y}>
      <Defs>
        <LinearGradient id="heat-legend" x1="0" y1="0" x2="1" y2="0">
          {stops.map((s) => (
            <Stop key={s.t} offset={String(s.t)} stopColor={s.c} />
          ))}
        </LinearGradient>
      </Defs>
      <Rect x={PAD} y={4} width={width - 2 * PAD} height={10} fill="url(#heat-legend)" stroke={drawing.pipeOutline} strokeWidth={1} />
      <SvgText x={PAD} y={30} fontSize={11} fontFamily={fonts.regular} fill={drawing.textMuted}>
        {show('temperature', minC, units)}
      </SvgText>
      <SvgText x={width - PAD} y={30} fontSize={11} fontFamily={fonts.regular} fill={drawing.textMuted} textAnchor="end">
        {show('temperature', maxC, units)}
      </SvgText>
      <SvgText x={width / 2} y={30} fontSize={11} fontFamily={fonts.regular} fill={drawing.textMuted} textAnchor="middle">
        Pipe temperature
      </SvgText>
    </G>
  );
}

/** In words, what the drawing shows: the accessible name of the picture. */
export function drawingLabel(job: JobDetail): string {
  const joints = job.runs.filter((r) => r.joint.type !== 'none').length;
  const supports = job.system.supports.length;
  const items = job.runs.reduce((s, r) => s + r.nearby.length, 0);
  const close = job.system.nearby.filter((n) => !n.ok).length;
  return `System drawing of ${job.name}: ${job.runs.length} runs in build order, ${joints} joints, ${supports} supports and fixings, ${items} nearby items${close ? `, ${close} too close` : ''}. Not to scale.`;
}

/** The job as a schematic: runs in order, coloured by temperature, with fixings, supports, joints and nearby items. */
export function SystemDrawing({ job, units }: { job: JobDetail; units: UnitSystem }) {
  const [width, setWidth] = useState(360);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.max(280, Math.round(e.nativeEvent.layout.width)));
  const temps = job.runs.flatMap((r) => r.segments.flatMap((s) => [s.startTempC, s.endTempC]));
  const minC = Math.min(20, ...temps);
  const maxC = Math.max(minC + 1, ...temps);
  const close = new Set(job.system.nearby.filter((n) => !n.ok).map((n) => `${n.runId}:${n.index}`));
  const height = job.runs.length * ROW + LEGEND + keyHeight(width, PAD);
  return (
    <View style={styles.box} onLayout={onLayout} role="img" aria-label={drawingLabel(job)}>
      <Svg width={width} height={height}>
        {job.runs.map((run, i) => (
          <RunRow
            key={run.id}
            run={run}
            index={i}
            width={width}
            units={units}
            closeItems={close}
            supports={job.system.supports.filter((s) => s.runId === run.id)}
          />
        ))}
        <Legend y={job.runs.length * ROW} width={width} minC={minC} maxC={maxC} units={units} />
        <SymbolKey y={job.runs.length * ROW + LEGEND} width={width} pad={PAD} />
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%', paddingVertical: spacing.sm },
});
