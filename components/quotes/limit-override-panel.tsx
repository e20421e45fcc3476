import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import type { z } from 'zod';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useUnits } from '../../hooks/use-units';
import { show } from '../units/format';
import { useCheckedForm } from '../forms/use-checked-form';
import { optionLimitState } from '../../shared/quotes/limit-cautions';
import type { PricedOption } from '../../shared/quotes/pricing';
import { limitOverrideSchema, type LimitOverrideView } from '../../shared/schemas/quotes';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { formatDateTime } from './format';

export interface LimitOverridePanelProps {
  options: PricedOption[];
  overrides: LimitOverrideView[];
  /** Engineers and admins may record an override while the quote is a draft. */
  canOverride: boolean;
  onOverride?: (input: z.output<typeof limitOverrideSchema>) => Promise<unknown>;
}

/** Options over or near their temperature limit: what the customer will read, and the override an over-limit option needs before sending. */
export function LimitOverridePanel({ options, overrides, canOverride, onOverride }: LimitOverridePanelProps) {
  const units = useUnits();
  const flagged = options.map((o, index) => ({ o, index, state: optionLimitState(o) })).filter((x) => x.state !== 'ok');
  if (flagged.length === 0) return null;
  return (
    <Card edge="accent">
      <View style={styles.stack} aria-label="Temperature limits">
        <Text variant="heading" headingLevel={2}>
          Temperature limits
        </Text>
        <Text tone="muted">
          An option over its limit cannot be sent until an engineer or admin records why it is still offered. The customer sees a plain caution beside every option over or near its limit.
        </Text>
        {flagged.map(({ o, index, state }) => {
          const override = overrides.find((x) => x.optionIndex === index);
          return (
            <View key={index} style={styles.option} role="group" aria-label={`Option ${index + 1} temperature`}>
              <Text variant="bodyStrong" tone={state === 'over' ? 'danger' : 'warning'}>
                Option {index + 1}, {o.label}:{' '}
                {state === 'over' ? `${show('temperatureDelta', -o.tempMarginC, units)} over its temperature limit` : `only ${show('temperatureDelta', o.tempMarginC, units)} below its temperature limit`}
              </Text>
              {state === 'over' && override ? (
                <Text>
                  Override by {override.by} ({formatDateTime(override.at)}): “{override.reason}”
                </Text>
              ) : null}
              {state === 'over' && !override && !canOverride ? (
                <Text tone="warning">Needs an override from an engineer or admin before the quote can be sent.</Text>
              ) : null}
              {state === 'over' && canOverride && onOverride ? (
                <OverrideControl optionIndex={index} replacing={Boolean(override)} onSubmit={onOverride} />
              ) : null}
            </View>
          );
        })}
      </View>
    </Card>
  );
}

interface OverrideFormProps {
  optionIndex: number;
  replacing: boolean;
  onSubmit: NonNullable<LimitOverridePanelProps['onOverride']>;
}

/** An option with no override shows the form; one with an override shows it only when asked to replace it. */
function OverrideControl(props: OverrideFormProps) {
  const [open, setOpen] = useState(false);
  if (!props.replacing || open) {
    return <OverrideForm {...props} onDone={() => setOpen(false)} onCancel={props.replacing ? () => setOpen(false) : undefined} />;
  }
  return (
    <View style={styles.actions}>
      <Button label={`Replace override for option ${props.optionIndex + 1}`} variant="secondary" compact onPress={() => setOpen(true)} />
    </View>
  );
}

function OverrideForm({ optionIndex, replacing, onSubmit, onDone, onCancel }: OverrideFormProps & { onDone: () => void; onCancel?: () => void }) {
  const [failure, setFailure] = useState<string>();
  const {
    control,
    handleSubmit,
    reset,
    formState: { errors, isSubmitting },
  } = useCheckedForm<z.input<typeof limitOverrideSchema>, unknown, z.output<typeof limitOverrideSchema>>({
    resolver: zodResolver(limitOverrideSchema),
    defaultValues: { optionIndex, reason: '' },
  });
  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    try {
      await onSubmit(values);
      reset({ optionIndex, reason: '' });
      onDone();
    } catch (error) {
      setFailure(messageOf(error));
    }
  });
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="reason"
        render={({ field: { onChange, onBlur, value, ref } }) => (
          <TextField
            ref={ref}
            label={replacing ? `New reason for the override of option ${optionIndex + 1}` : `Reason for the override of option ${optionIndex + 1}`}
            value={value}
            onChangeText={onChange}
            onBlur={onBlur}
            error={errors.reason?.message}
            hint="Why the option is still offered, for the quote's history and the customer."
            multiline
            numberOfLines={3}
          />
        )}
      />
      {failure ? <ErrorBanner title="The override was not recorded" message={failure} /> : null}
      <View style={styles.actions}>
        <Button
          label={replacing ? `Save the new reason for option ${optionIndex + 1}` : `Record override for option ${optionIndex + 1}`}
          variant="secondary"
          compact
          loading={isSubmitting}
          onPress={() => void submit()}
        />
        {onCancel ? <Button label={`Keep the override of option ${optionIndex + 1}`} variant="ghost" compact onPress={onCancel} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: spacing.md },
  option: { gap: spacing.xs },
  form: { gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
