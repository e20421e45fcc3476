import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { spacing } from '../../constants/theme';
import { currencyCodeSchema, currencyRateInputSchema } from '../../shared/schemas/currency-rate';
import { Button } from '../ui/button';
import { ErrorBanner } from '../ui/error-banner';
import { NumberField } from '../ui/number-field';
import { placeServerErrors } from '../ui/server-errors';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

const formSchema = currencyRateInputSchema.extend({ from: currencyCodeSchema });
type FormValues = z.infer<typeof formSchema>;

export interface RateFormProps {
  shopCurrency: string;
  onSubmit: (values: FormValues) => Promise<unknown>;
}

/** Sets (or replaces) the rate from one currency into the shop's. */
export function RateForm({ shopCurrency, onSubmit }: RateFormProps) {
  const [failure, setFailure] = useState<string | null>(null);
  const { control, handleSubmit, reset, setError, formState } = useCheckedForm<z.input<typeof formSchema>, unknown, FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { from: '', rate: Number.NaN },
  });
  const submit = handleSubmit(async (values) => {
    setFailure(null);
    try {
      await onSubmit(values);
      reset({ from: '', rate: Number.NaN });
    } catch (e) {
      setFailure(placeServerErrors(e, setError));
    }
  });
  return (
    <View style={styles.form}>
      <Controller
        control={control}
        name="from"
        render={({ field, fieldState }) => (
          <TextField
            ref={field.ref}
            label="Currency of the price"
            value={field.value ?? ''}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            autoCapitalize="characters"
            maxLength={3}
            error={fieldState.error?.message}
            hint="Three letters, e.g. USD or GBP."
          />
        )}
      />
      <Controller
        control={control}
        name="rate"
        render={({ field, fieldState }) => (
          <NumberField
            ref={field.ref}
            label={`${shopCurrency} for one unit of that currency`}
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
            hint={`What one unit costs in ${shopCurrency}, e.g. 0.92 for a dollar.`}
          />
        )}
      />
      {failure ? <ErrorBanner title="The rate was not saved" message={failure} /> : null}
      <Button label="Save rate" onPress={() => void submit()} loading={formState.isSubmitting} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.md },
});
