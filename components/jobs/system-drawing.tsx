import { useState } from 'react';
import { type LayoutChangeEvent, StyleSheet, View } from 'react-native';
import Svg, { Circle, Defs, G, Line, LinearGradient, Path, Rect, Stop, Text as SvgText } from 'react-native-svg';
import { drawing, fonts, spacing } from '../../constants/theme';
import { fixedPointLabel, fixedPointRole, type FixingRole } from '../../shared/jobs/fixed-points';
import { jointPositionMm } from '../../shared/jobs/run-movement';
import type { PlannedSupport } from '../../shared/jobs/support-plan';
import type { JobDetail, RunView } from '../../shared/schemas/jobs';
import { show } from '../units/format';
import type { UnitSystem } from '../../shared/units';
import { heatColour } from './heat-colour';

const ROW = 104;
const PAD = 28;
const PIPE_Y = 46;
const PIPE_H = 12;
const LEGEND = 44;

type Mark = { x: number; label: string };

function FixingMark({ role, x }: { role: FixingRole; x: number }) {
  const y = PIPE_Y + PIPE_H / 2;
  switch (role) {
    case 'engine':
      return <Rect x={x - 4} y={y - 16} width={8} height={32} fill={drawing.fixing} />;
    case 'anchor':
      return <Rect x={x - 7} y={y - 7} width={14} height={14} fill={drawing.fixing} />;
    case 'slide':
      return <SlideMark x={x} />;
    case 'hanger':
      return <HangerMark x={x} />;
    case 'free':
      return <Circle cx={x} cy={y} r={6} fill="none" stroke={drawing.fixing} strokeWidth={2} />;
    default:
      return null;
  }
}

function SlideMark({ x }: { x: number }) {
  const y = PIPE_Y + PIPE_H;
  return (
    <G>
      <Path d={`M ${x - 8} ${y + 12} L ${x} ${y + 2} L ${x + 8} ${y + 12} Z`} fill={drawing.support} />
      <Line x1={x - 11} y1={y + 14} x2={x + 11} y2={y + 14} stroke={drawing.support} strokeWidth={2} />
    </G>
  );
}

function HangerMark({ x }: { x: number }) {
  return (
    <G>
      <Line x1={x} y1={PIPE_Y - 16} x2={x} y2={PIPE_Y} stroke={drawing.support} strokeWidth={2} />
      <Circle cx={x} cy={PIPE_Y - 18} r={3} fill={drawing.support} />
    </G>
  );
}

function JointMark({ type, x }: { type: 'flex' | 'slip'; x: number }) {
  const top = PIPE_Y - 4;
  const bottom = PIPE_Y + PIPE_H + 4;
  if (type === 'slip') {
    return <Rect x={x - 9} y={top} width={18} height={bottom - top} fill="none" stroke={drawing.joint} strokeWidth={2} />;
  }
  const zig = [-9, -6, -3, 0, 3, 6, 9].map((dx, i) => `${i === 0 ? 'M' : 'L'} ${x + dx} ${i % 2 === 0 ? top : bottom}`).join(' ');
  return <Path d={zig} fill="none" stroke={drawing.joint} strokeWidth={2} />;
}

function RunRow({ run, index, width, units, closeItems, supports }: { run: RunView; index: number; width: number; units: UnitSystem; closeItems: Set<string>; supports: PlannedSupport[] }) {
  const length = run.segments.reduce((s, g) => s + g.lengthMm, 0);
  const x = (mm: number) => PAD + ((width - 2 * PAD) * Math.min(Math.max(mm, 0), length)) / length;
  let along = 0;
  const segs = run.segments.map((g) => {
    const from = along;
    along += g.lengthMm;
    return { from, to: along, g };
  });
  const marks: Mark[] = [];
  const r = run.result;
  const joint = run.joint.type === 'none' ? null : jointPositionMm(run, length);
  if (r && run.joint.type !== 'none' && joint !== null) marks.push({ x: x(joint), label: `↔ ${show('smallLength', r.growthMm, units)}` });
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
        <Rect key={i} x={x(s.from)} y={PIPE_Y} width={Math.max(1, x(s.to) - x(s.from))} height={PIPE_H} fill={`url(#heat-${run.id}-${i})`} stroke={drawing.pipeOutline} strokeWidth={1} />
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
            <Path d={`M ${cx} ${cy - 6} L ${cx + 6} ${cy} L ${cx} ${cy + 6} L ${cx - 6} ${cy} Z`} fill={close ? drawing.nearbyClose : drawing.nearbyOk} />
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
  const stops = [0, 0.25, 0.5, 0.75, 1].map((t) => ({ t, c: heatColour(minC + (maxC - minC) * t) }));
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
  const height = job.runs.length * ROW + LEGEND;
  return (
    <View style={styles.box} onLayout={onLayout} role="img" aria-label={drawingLabel(job)}>
      <Svg width={width} height={height}>
        {job.runs.map((run, i) => (
          <RunRow key={run.id} run={run} index={i} width={width} units={units} closeItems={close} supports={job.system.supports.filter((s) => s.runId === run.id)} />
        ))}
        <Legend y={job.runs.length * ROW} width={width} minC={minC} maxC={maxC} units={units} />
      </Svg>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { width: '100%', paddingVertical: spacing.sm },
});
