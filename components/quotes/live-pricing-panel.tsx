import { useMemo } from 'react';
import { type Control, useWatch } from 'react-hook-form';
import type { PricedAlloy } from '../../shared/quotes/pricing';
import type { QuoteInputDraft } from '../../shared/schemas/quotes';
import { messageOf } from '../../hooks/api-client';
import { useJobQuery } from '../../hooks/use-jobs';
import { useShopSettingsQuery } from '../../hooks/use-shop-settings';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { priceLive, runsForPricing } from './live-pricing';
import { QuoteFigures } from './quote-figures';

export interface LivePricingPanelProps {
  control: Control<QuoteInputDraft>;
  alloys: ReadonlyMap<string, PricedAlloy>;
}

/** Totals and differences recomputed on every keystroke from the form's current values. */
export function LivePricingPanel({ control, alloys }: LivePricingPanelProps) {
  const jobId = useWatch({ control, name: 'jobId' });
  const options = useWatch({ control, name: 'options' }) ?? [];
  const job = useJobQuery(jobId || undefined);
  const settings = useShopSettingsQuery();
  const runs = useMemo(() => (job.data ? runsForPricing(job.data) : []), [job.data]);

  if (!jobId) return <EmptyState title="Pick a job to see prices" message="Totals and differences appear here as you choose alloys." />;
  if (job.isPending || settings.isPending) return <LoadingState label="Pricing the options…" />;
  if (job.isError) return <ErrorBanner title="The job did not load" message={messageOf(job.error)} onRetry={() => void job.refetch()} />;
  if (settings.isError) return <ErrorBanner title="The shop’s quoting rules did not load" message={messageOf(settings.error)} onRetry={() => void settings.refetch()} />;
  if (runs.length === 0) return <EmptyState title="This job has no runs yet" message="A fabricator adds the runs of tube; then the job can be quoted." />;

  const live = priceLive(runs, alloys, settings.data, options);
  return (
    <QuoteFigures
      title="Live totals"
      caption={`Priced now from ${runs.length} run${runs.length === 1 ? '' : 's'} of “${job.data.name}” and today’s published catalogue. Prices freeze when the quote is sent.`}
      labels={options.map((o) => o.label ?? '')}
      currency={live.currency}
      settings={settings.data}
      options={live.options}
      comparisons={live.comparisons}
    />
  );
}
