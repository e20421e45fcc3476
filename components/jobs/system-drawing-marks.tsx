import { Circle, G, Line, Path, Rect } from 'react-native-svg';
import { drawing } from '../../constants/theme';
import type { FixingRole } from '../../shared/jobs/fixed-points';

/** Where the pipe sits in each run's row of the system drawing; every mark is placed against it. */
export const PIPE_Y = 46;
export const PIPE_H = 12;

export function FixingMark({ role, x }: { role: FixingRole; x: number }) {
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

export function SlideMark({ x }: { x: number }) {
  const y = PIPE_Y + PIPE_H;
  return (
    <G>
      <Path d={`M ${x - 8} ${y + 12} L ${x} ${y + 2} L ${x + 8} ${y + 12} Z`} fill={drawing.support} />
      <Line x1={x - 11} y1={y + 14} x2={x + 11} y2={y + 14} stroke={drawing.support} strokeWidth={2} />
    </G>
  );
}

export function HangerMark({ x }: { x: number }) {
  return (
    <G>
      <Line x1={x} y1={PIPE_Y - 16} x2={x} y2={PIPE_Y} stroke={drawing.support} strokeWidth={2} />
      <Circle cx={x} cy={PIPE_Y - 18} r={3} fill={drawing.support} />
    </G>
  );
}

export function JointMark({ type, x }: { type: 'flex' | 'slip'; x: number }) {
  const top = PIPE_Y - 4;
  const bottom = PIPE_Y + PIPE_H + 4;
  if (type === 'slip') {
    return <Rect x={x - 9} y={top} width={18} height={bottom - top} fill="none" stroke={drawing.joint} strokeWidth={2} />;
  }
  const zig = [-9, -6, -3, 0, 3, 6, 9].map((dx, i) => `${i === 0 ? 'M' : 'L'} ${x + dx} ${i % 2 === 0 ? top : bottom}`).join(' ');
  return <Path d={zig} fill="none" stroke={drawing.joint} strokeWidth={2} />;
}

export function NearbyMark({ cx, cy, close }: { cx: number; cy: number; close: boolean }) {
  return <Path d={`M ${cx} ${cy - 6} L ${cx + 6} ${cy} L ${cx} ${cy + 6} L ${cx - 6} ${cy} Z`} fill={close ? drawing.nearbyClose : drawing.nearbyOk} />;
}
