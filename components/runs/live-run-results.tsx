import { useEffect } from 'react';
import { useWatch, type Control } from 'react-hook-form';
import type { RunFields } from '../../shared/schemas/jobs';
import type { UnitSystem } from '../../shared/units';
import type { FieldMessages } from './field-errors';
import { RunResults } from './run-results';
import { useLiveResult, useStableValue } from './use-live-result';

const NO_MESSAGES: FieldMessages = {};

export interface LiveRunResultsProps {
  control: Control<RunFields>;
  units: UnitSystem;
  /** Where the data does not cover the run, the engine's messages for the fields (called only when they change). */
  onEngineFields: (fields: FieldMessages) => void;
}

/**
 * The one part of the editor that watches every value: it computes on each input and hands the results
 * panel objects that stay the same while nothing they show has changed, so the form itself does not
 * render again on a keystroke.
 */
export function LiveRunResults({ control, units, onEngineFields }: LiveRunResultsProps) {
  const values = useWatch({ control }) as RunFields;
  const live = useLiveResult(values);
  const { name: _name, notes: _notes, ...shown } = values;
  const fields = useStableValue(values, JSON.stringify(shown));
  const engineFields = live.state === 'outside' ? live.fields : NO_MESSAGES;
  const engineKey = JSON.stringify(engineFields);
  useEffect(() => {
    onEngineFields(engineFields);
    // The key stands for the messages.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [engineKey]);
  return <RunResults live={live} fields={fields} units={units} />;
}
