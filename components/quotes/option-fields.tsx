import { type Control, Controller, type FieldErrors, type UseFormGetValues, type UseFormSetValue } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import type { QuoteInputDraft } from '../../shared/schemas/quotes';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { type Choice, ChoicePicker } from '../ui/choice-picker';
import { RunOverrides } from './run-overrides';

export interface OptionFieldsProps {
  index: number;
  control: Control<QuoteInputDraft>;
  errors: FieldErrors<QuoteInputDraft>;
  setValue: UseFormSetValue<QuoteInputDraft>;
  getValues: UseFormGetValues<QuoteInputDraft>;
  alloyChoices: Choice[];
  runs: { id: string; name: string }[];
  onRemove?: () => void;
}

/** One material option: its name, the alloy for every run, and any runs in another alloy. */
export function OptionFields({ index, control, errors, setValue, getValues, alloyChoices, runs, onRemove }: OptionFieldsProps) {
  const number = index + 1;
  const optionErrors = errors.options?.[index];
  return (
    <Card edge={index === 0 ? 'primary' : 'muted'}>
      <View role="group" aria-label={`Option ${number}`} style={styles.body}>
        <View style={styles.header}>
          <Text variant="heading" headingLevel={3}>
            Option {number}
            {index === 0 ? ' (the baseline)' : ''}
          </Text>
          {onRemove ? <Button label="Remove" accessibilityLabel={`Remove option ${number}`} variant="ghost" compact onPress={onRemove} /> : null}
        </View>
        <Controller
          control={control}
          name={`options.${index}.alloyId`}
          render={({ field: { onChange, value } }) => (
            <ChoicePicker
              label={`Alloy for option ${number}`}
              choices={alloyChoices}
              value={value}
              placeholder="Choose an alloy"
              error={optionErrors?.alloyId?.message}
              onChange={(alloyId) => {
                onChange(alloyId);
                // A fresh option is named after its alloy until the user names it.
                if (!getValues(`options.${index}.label`)) {
                  const chosen = alloyChoices.find((c) => c.value === alloyId);
                  if (chosen) setValue(`options.${index}.label`, `${chosen.label.split(' (')[0]} throughout`, { shouldValidate: true });
                }
              }}
            />
          )}
        />
        <Controller
          control={control}
          name={`options.${index}.label`}
          render={({ field: { onChange, onBlur, value, ref } }) => (
            <TextField
              ref={ref}
              label={`Name of option ${number}`}
              value={value ?? ''}
              onChangeText={onChange}
              onBlur={onBlur}
              error={optionErrors?.label?.message}
              hint="What the customer reads, e.g. “Type 321 throughout”"
            />
          )}
        />
        <Controller
          control={control}
          name={`options.${index}.runAlloys`}
          render={({ field: { onChange, value } }) => (
            <RunOverrides optionNumber={number} runs={runs} alloyChoices={alloyChoices} value={value} onChange={onChange} />
          )}
        />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  body: { gap: spacing.md },
  header: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm, flexWrap: 'wrap' },
});
