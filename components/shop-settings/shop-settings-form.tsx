import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import type { z } from 'zod';
import { type Control, Controller } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { spacing } from '../../constants/theme';
import { ALLOY_FAMILIES, FAMILY_LABELS } from '../../shared/schemas/alloy';
import { shopSettingsSchema, type ShopSettings } from '../../shared/schemas/shop-settings';
import { NEARBY_KINDS, NEARBY_LABELS, type NearbyKind } from '../../shared/jobs/nearby';
import { useUnits } from '../../hooks/use-units';
import type { QuantityKind } from '../../shared/units';
import { UnitNumberField } from '../units/unit-number-field';
import { placeServerErrors } from '../ui/server-errors';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { useCheckedForm } from '../forms/use-checked-form';

type Values = z.input<typeof shopSettingsSchema>;
type NumberPath = 'labourRatePerHour' | 'hoursPerRun' | 'scrapAllowancePct' | 'marginPct' | 'depositSharePct' | 'travelSharePct' | 'coldestStartC' | 'supportNearJointMm' | 'engineSupportMm' | `nearbyMinimumsMm.${NearbyKind}` | `weldTimeFactors.${(typeof ALLOY_FAMILIES)[number]}`;

export interface ShopSettingsFormProps {
  defaultValues: ShopSettings;
  /** Saves; a rejection keeps every edit and shows the server's messages under the fields. */
  onSubmit: (values: ShopSettings) => Promise<unknown>;
}

/** A setting typed as a plain number, or (with `kind`) in the user's units and kept in mm or °C. */
function NumberInput({ control, name, label, hint, error, kind }: { control: Control<Values>; name: NumberPath; label: string; hint?: string; error?: string; kind?: QuantityKind }) {
  const units = useUnits();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field: { onChange, onBlur, value, ref } }) => (
        <UnitNumberField ref={ref} label={label} kind={kind} units={units} value={value as number} onChange={onChange} onBlur={onBlur} hint={hint} error={error} />
      )}
    />
  );
}

export function ShopSettingsForm({ defaultValues, onSubmit }: ShopSettingsFormProps) {
  const [failure, setFailure] = useState<string>();
  const [saved, setSaved] = useState(false);
  const {
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useCheckedForm<Values, unknown, ShopSettings>({ resolver: zodResolver(shopSettingsSchema), defaultValues });

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    setSaved(false);
    try {
      await onSubmit(values);
      reset({ ...values, isDemo: false });
      setSaved(true);
    } catch (error) {
      setFailure(placeServerErrors(error, setError));
    }
  });

  return (
    <View style={styles.form}>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Shop
        </Text>
        <Controller
          control={control}
          name="shopName"
          render={({ field: { onChange, onBlur, value, ref } }) => (
            <TextField ref={ref} label="Shop name" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.shopName?.message} hint="Signs the quotes and heads the customer’s page" />
          )}
        />
        <Controller
          control={control}
          name="currency"
          render={({ field: { onChange, onBlur, value, ref } }) => (
            <TextField ref={ref} label="Currency" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.currency?.message} hint="Three letters, e.g. EUR, GBP, USD" autoCapitalize="characters" maxLength={3} />
          )}
        />
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Labour
        </Text>
        <NumberInput control={control} name="labourRatePerHour" label="Labour rate per hour" error={errors.labourRatePerHour?.message} />
        <NumberInput control={control} name="hoursPerRun" label="Hours per run" hint="Cutting, fitting and welding one run in austenitic stainless" error={errors.hoursPerRun?.message} />
        <Text variant="label">Weld-time factor per alloy family</Text>
        <Text variant="caption" tone="muted">
          Hours per run are multiplied by the family’s factor; austenitic stainless is 1.
        </Text>
        {ALLOY_FAMILIES.map((family) => (
          <NumberInput key={family} control={control} name={`weldTimeFactors.${family}`} label={`Weld-time factor, ${FAMILY_LABELS[family]}`} error={errors.weldTimeFactors?.[family]?.message} />
        ))}
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Material and margin
        </Text>
        <NumberInput control={control} name="scrapAllowancePct" label="Scrap allowance (%)" hint="Added to the material cost for offcuts and test pieces" error={errors.scrapAllowancePct?.message} />
        <NumberInput control={control} name="marginPct" label="Margin (%)" hint="On material and labour together" error={errors.marginPct?.message} />
        <NumberInput control={control} name="depositSharePct" label="Deposit on acceptance (%)" hint="Whole percent of the accepted total, paid online; 0 turns deposits off" error={errors.depositSharePct?.message} />
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Joint design
        </Text>
        <Text variant="caption" tone="muted">
          Every flex and slip joint in every job is sized on these two figures. The defaults are common practice, with no published source behind them; the part maker’s ratings and your engineer’s rules come first.
        </Text>
        <NumberInput
          control={control}
          name="travelSharePct"
          label="Share of rated travel a joint may use (%)"
          hint="Computed movement against a flex part’s ratings or a slip joint’s gap; 70 % by default"
          error={errors.travelSharePct?.message}
        />
        <NumberInput
          control={control}
          name="coldestStartC"
          label="Coldest start"
          kind="temperature"
          hint="The coldest ambient a system starts from; joints are checked from here to the hottest running state"
          error={errors.coldestStartC?.message}
        />
      </Card>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Supports and clearances
        </Text>
        <Text variant="caption" tone="muted">
          The system check of every job uses these. The defaults are common practice, with no published source; the vehicle or equipment maker’s rules and local codes come first.
        </Text>
        <NumberInput control={control} name="supportNearJointMm" label="Support beside a joint within" kind="length" hint="On each side of every flex and slip joint" error={errors.supportNearJointMm?.message} />
        <NumberInput control={control} name="engineSupportMm" label="First support after an engine flange within" kind="length" hint="So the turbo or manifold flange does not carry the pipe" error={errors.engineSupportMm?.message} />
        <Text variant="label">Hot gap to keep, by what sits near the pipe</Text>
        {NEARBY_KINDS.map((kind) => (
          <NumberInput
            key={kind}
            control={control}
            name={`nearbyMinimumsMm.${kind}`}
            label={`Hot gap to a ${NEARBY_LABELS[kind].toLowerCase()}`}
            kind="length"
            error={errors.nearbyMinimumsMm?.[kind]?.message}
          />
        ))}
      </Card>
      {failure ? <ErrorBanner title="The settings were not saved" message={failure} /> : null}
      {saved ? (
        <View accessible accessibilityRole="alert" aria-live="polite">
          <Text tone="success" variant="bodyStrong">
            Saved. New drafts are priced with these rules; sent quotes keep theirs.
          </Text>
        </View>
      ) : null}
      <Button label={isSubmitting ? 'Saving…' : 'Save settings'} accessibilityLabel="Save settings" loading={isSubmitting} onPress={() => void submit()} />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.xl },
});
