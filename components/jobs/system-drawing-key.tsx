import type { ReactNode } from 'react';
import { G, Text as SvgText } from 'react-native-svg';
import { drawing, fonts } from '../../constants/theme';
import { FixingMark, HangerMark, JointMark, NearbyMark, PIPE_H, PIPE_Y, SlideMark } from './system-drawing-marks';

const CELL_W = 132;
const CELL_H = 40;
const MARK_X = 12;

const ENTRIES: { label: string; mark: ReactNode }[] = [
  {
    label: 'Engine or turbo flange',
    mark: <FixingMark role="engine" x={MARK_X} />,
  },
  {
    label: 'Fixed anchor or clamp',
    mark: <FixingMark role="anchor" x={MARK_X} />,
  },
  {
    label: 'Sliding support',
    mark: (
      <G y={-10}>
        <SlideMark x={MARK_X} />
      </G>
    ),
  },
  {
    label: 'Hanger',
    mark: (
      <G y={12}>
        <HangerMark x={MARK_X} />
      </G>
    ),
  },
  { label: 'Free end', mark: <FixingMark role="free" x={MARK_X} /> },
  { label: 'Flex section', mark: <JointMark type="flex" x={MARK_X} /> },
  { label: 'Slip joint', mark: <JointMark type="slip" x={MARK_X} /> },
  {
    label: 'Nearby item, clear',
    mark: <NearbyMark cx={MARK_X} cy={PIPE_Y + PIPE_H / 2} close={false} />,
  },
  {
    label: 'Nearby item, too close',
    mark: <NearbyMark cx={MARK_X} cy={PIPE_Y + PIPE_H / 2} close />,
  },
];

function columns(width: number, pad: number): number {
  return Math.max(1, Math.floor((width - 2 * pad + 18) / CELL_W));
}

export function keyHeight(width: number, pad: number): number {
  return Math.ceil(ENTRIES.length / columns(width, pad)) * CELL_H + 8;
}

/** What each mark of the system drawing means, laid out in as many columns as fit. */
export function SymbolKey({ y, width, pad }: { y: number; width: number; pad: number }) {
  const cols = columns(width, pad);
  return (
    <G y={y}>
      {ENTRIES.map((e, i) => {
        const cx = pad - 18 + (i % cols) * CELL_W;
        const cy = Math.floor(i / cols) * CELL_H + CELL_H / 2;
        return (
          <G key={e.label}>
            <G x={cx} y={cy - PIPE_Y - PIPE_H / 2}>
              {e.mark}
            </G>
            <SvgText x={cx + MARK_X + 16} y={cy + 4} fontSize={11} fontFamily={fonts.regular} fill={drawing.text}>
              {e.label}
            </SvgText>
          </G>
        );
      })}
    </G>
  );
}
