import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useState } from 'react';
import { Controller, useFieldArray, useWatch } from 'react-hook-form';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { layout, spacing } from '../../constants/theme';
import { useJobQuery } from '../../hooks/use-jobs';
import { useUnits } from '../../hooks/use-units';
import { formatQuantity } from '../../shared/units';
import type { AlloySummary } from '../../shared/schemas/alloy';
import type { JobSummary } from '../../shared/schemas/jobs';
import { quoteInputSchema, type QuoteInput, type QuoteInputDraft } from '../../shared/schemas/quotes';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { ChoicePicker } from '../ui/choice-picker';
import { pricedAlloys } from './live-pricing';
import { LivePricingPanel } from './live-pricing-panel';
import { OptionFields } from './option-fields';
import { placeServerErrors } from '../ui/server-errors';
import { FieldError } from '../ui/field-error';
import { useCheckedForm } from '../forms/use-checked-form';

export const MIN_OPTIONS = 2;
export const MAX_OPTIONS = 4;
const emptyOption = () => ({ label: '', alloyId: '' });

export interface QuoteFormProps {
  jobs: JobSummary[];
  alloys: AlloySummary[];
  defaultValues: QuoteInputDraft;
  submitLabel: string;
  /** Saves; a rejection keeps every edit on screen and places the server's messages under their fields. */
  onSubmit: (values: QuoteInput) => Promise<unknown>;
  /** Told whether the form holds edits that are not saved yet. */
  onDirtyChange?: (dirty: boolean) => void;
}

export function QuoteForm({ jobs, alloys, defaultValues, submitLabel, onSubmit, onDirtyChange }: QuoteFormProps) {
  const wide = useWindowDimensions().width >= layout.wideBreakpoint;
  const [failure, setFailure] = useState<string>();
  const [saved, setSaved] = useState(false);
  const {
    control,
    handleSubmit,
    setError,
    setValue,
    getValues,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useCheckedForm<QuoteInputDraft, unknown, QuoteInput>({ resolver: zodResolver(quoteInputSchema), defaultValues });
  const { fields, append, remove } = useFieldArray({ control, name: 'options' });
  const jobId = useWatch({ control, name: 'jobId' });
  const job = useJobQuery(jobId || undefined);

  const units = useUnits();
  const published = useMemo(() => alloys.filter((a) => a.status === 'published'), [alloys]);
  const priced = useMemo(() => pricedAlloys(published), [published]);
  const alloyChoices = useMemo(
    () => published.map((a) => ({ value: a.id, label: `${a.designation} (${a.uns})`, hint: `Service to about ${formatQuantity('temperature', Math.min(a.maxContinuousC, a.maxIntermittentC), units).text}` })),
    [published, units],
  );
  const jobChoices = jobs.map((j) => ({ value: j.id, label: j.name, hint: `${j.customer} · ${j.runCount} run${j.runCount === 1 ? '' : 's'}` }));
  const runs = job.data?.runs.map((r) => ({ id: r.id, name: r.name })) ?? [];

  const submit = handleSubmit(async (values) => {
    setFailure(undefined);
    setSaved(false);
    try {
      await onSubmit(values);
      // What was saved becomes the new starting point, so "unsaved edits" means edits since then.
      reset(values);
      setSaved(true);
    } catch (error) {
      setFailure(placeServerErrors(error, setError));
    }
  });

  useEffect(() => onDirtyChange?.(isDirty), [isDirty, onDirtyChange]);

  const optionsError = errors.options?.message ?? errors.options?.root?.message;

  const customer = (
    <Card>
      <Text variant="heading" headingLevel={2}>
        Job and customer
      </Text>
      <View style={styles.grid}>
        <View style={styles.field}>
          <Controller
            control={control}
            name="jobId"
            render={({ field: { onChange, value } }) => (
              <ChoicePicker label="Job" choices={jobChoices} value={value} placeholder="Choose a job" error={errors.jobId?.message} onChange={onChange} />
            )}
          />
        </View>
        <View style={styles.field}>
          <Controller
            control={control}
            name="customerName"
            render={({ field: { onChange, onBlur, value, ref } }) => (
              <TextField ref={ref} label="Customer name" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.customerName?.message} autoCapitalize="words" />
            )}
          />
        </View>
        <View style={styles.field}>
          <Controller
            control={control}
            name="customerEmail"
            render={({ field: { onChange, onBlur, value, ref } }) => (
              <TextField
                ref={ref}
                label="Customer e-mail"
                value={value}
                onChangeText={onChange}
                onBlur={onBlur}
                error={errors.customerEmail?.message}
                keyboardType="email-address"
                autoCapitalize="none"
                autoComplete="off"
              />
            )}
          />
        </View>
        <View style={styles.field}>
          <Controller
            control={control}
            name="customerCompany"
            render={({ field: { onChange, onBlur, value, ref } }) => (
              <TextField ref={ref} label="Company" value={value ?? ''} onChangeText={onChange} onBlur={onBlur} error={errors.customerCompany?.message} hint="Optional" />
            )}
          />
        </View>
        <View style={styles.field}>
          <Controller
            control={control}
            name="validUntil"
            render={({ field: { onChange, onBlur, value, ref } }) => (
              <TextField ref={ref} label="Valid until" value={value} onChangeText={onChange} onBlur={onBlur} error={errors.validUntil?.message} hint="YYYY-MM-DD; the link stops working after this day" autoCapitalize="none" />
            )}
          />
        </View>
        <View style={styles.field}>
          <Controller
            control={control}
            name="message"
            render={({ field: { onChange, onBlur, value, ref } }) => (
              <TextField ref={ref} label="Message to the customer" value={value ?? ''} onChangeText={onChange} onBlur={onBlur} error={errors.message?.message} multiline numberOfLines={3} hint="Optional; goes into the e-mail" />
            )}
          />
        </View>
      </View>
    </Card>
  );

  const optionList = (
    <View style={styles.options}>
      <Text variant="heading" headingLevel={2}>
        Material options
      </Text>
      <Text tone="muted" variant="caption">
        Two to four options. Each sets the alloy for every run; options 2 on are compared with option 1.
      </Text>
      <FieldError message={optionsError} />
      {fields.map((f, i) => (
        <OptionFields
          key={f.id}
          index={i}
          control={control}
          errors={errors}
          setValue={setValue}
          getValues={getValues}
          alloyChoices={alloyChoices}
          runs={runs}
          onRemove={fields.length > MIN_OPTIONS ? () => remove(i) : undefined}
        />
      ))}
      {fields.length < MAX_OPTIONS ? <Button label="Add an option" variant="secondary" onPress={() => append(emptyOption())} /> : null}
    </View>
  );

  const footer = (
    <View style={styles.footer}>
      {failure ? <ErrorBanner title="The quote was not saved" message={failure} /> : null}
      {saved ? (
        <View accessible accessibilityRole="alert" aria-live="polite">
          <Text tone="success" variant="bodyStrong">
            Saved.
          </Text>
        </View>
      ) : null}
      <Button label={isSubmitting ? 'Saving…' : submitLabel} accessibilityLabel={submitLabel} loading={isSubmitting} onPress={() => void submit()} />
    </View>
  );

  const figures = <LivePricingPanel control={control} alloys={priced} />;

  // Wide: the options and their live figures side by side, so a change and its effect are both in view.
  return (
    <View style={styles.stack}>
      {customer}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.optionsColumn}>{optionList}</View>
          <View style={styles.figuresColumn}>{figures}</View>
        </View>
      ) : (
        <>
          {optionList}
          {figures}
        </>
      )}
      {footer}
    </View>
  );
}

export function newQuoteDefaults(validUntil: string): QuoteInputDraft {
  return { jobId: '', customerName: '', customerEmail: '', customerCompany: '', validUntil, message: '', options: [emptyOption(), emptyOption()] };
}

const styles = StyleSheet.create({
  footer: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.md },
  field: { flexGrow: 1, flexBasis: 300 },
  options: { gap: spacing.md },
  stack: { gap: spacing.xxl },
  columns: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.xl },
  optionsColumn: { flex: 4, gap: spacing.md },
  figuresColumn: { flex: 6, gap: spacing.md },
});
