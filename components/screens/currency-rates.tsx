import { StyleSheet, View } from 'react-native';
import { RateForm } from '../currency-rates/rate-form';
import { RateList } from '../currency-rates/rate-list';
import { Card } from '../ui/card';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useCurrencyRatesQuery, useRemoveCurrencyRateMutation, useSetCurrencyRateMutation } from '../../hooks/use-currency-rates';
import { useSessionQuery } from '../../hooks/use-session';
import { useScreenTitle } from '../ui/use-screen-title';

export default function CurrencyRatesScreen() {
  const { data: me } = useSessionQuery();
  const rates = useCurrencyRatesQuery();
  const save = useSetCurrencyRateMutation();
  const remove = useRemoveCurrencyRateMutation();

  useScreenTitle('Currency rates');
  if (!me) return <LoadingState />;
  return (
    <Screen narrow>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Currency rates
        </Text>
        <Text tone="muted">
          Job totals and quotes are in the shop&apos;s currency. An alloy priced in another currency is converted at the rate set here, or left out of totals and refused in quotes until a rate is set.
        </Text>
      </View>
      {rates.isPending ? (
        <LoadingState label="Loading the rates…" />
      ) : rates.isError ? (
        <ErrorBanner title="The rates did not load" message={messageOf(rates.error)} onRetry={() => void rates.refetch()} />
      ) : (
        <>
          <Card>
            <Text variant="heading" headingLevel={2}>
              Rates into {rates.data.shopCurrency}
            </Text>
            <RateList
              shopCurrency={rates.data.shopCurrency}
              rates={rates.data.rates}
              onRemove={me.role === 'admin' ? (from) => remove.mutate(from) : undefined}
              removing={remove.isPending ? remove.variables : null}
            />
            {remove.isError ? <ErrorBanner title="The rate was not removed" message={messageOf(remove.error)} /> : null}
          </Card>
          {me.role === 'admin' ? (
            <Card>
              <Text variant="heading" headingLevel={2}>
                Set a rate
              </Text>
              <RateForm shopCurrency={rates.data.shopCurrency} onSubmit={(values) => save.mutateAsync(values)} />
            </Card>
          ) : (
            <Text tone="muted">Only an admin sets rates.</Text>
          )}
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
