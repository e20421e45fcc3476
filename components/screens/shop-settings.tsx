import { StyleSheet, View } from 'react-native';
import { DemoValuesNote } from '../quotes/demo-values-note';
import { ShopSettingsForm } from '../shop-settings/shop-settings-form';
import { EmptyState } from '../ui/empty-state';
import { ErrorBanner } from '../ui/error-banner';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { messageOf } from '../../hooks/api-client';
import { useSessionQuery } from '../../hooks/use-session';
import { useSaveShopSettingsMutation, useShopSettingsQuery } from '../../hooks/use-shop-settings';
import { useScreenTitle } from '../ui/use-screen-title';

export default function ShopSettingsScreen() {
  const { data: me } = useSessionQuery();
  const settings = useShopSettingsQuery();
  const save = useSaveShopSettingsMutation();

  useScreenTitle('Shop settings');
  if (!me) return <LoadingState />;
  return (
    <Screen narrow>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Shop settings
        </Text>
        <Text tone="muted">The rules every quote is priced with: labour, weld time per alloy family, scrap and margin.</Text>
      </View>
      {me.role !== 'admin' ? (
        <EmptyState title="Only an admin changes the quoting rules" message="Ask your shop’s Dilato admin." />
      ) : settings.isPending ? (
        <LoadingState label="Loading the settings…" />
      ) : settings.isError ? (
        <ErrorBanner title="The settings did not load" message={messageOf(settings.error)} onRetry={() => void settings.refetch()} />
      ) : (
        <>
          {settings.data.isDemo ? <DemoValuesNote /> : null}
          <ShopSettingsForm defaultValues={settings.data} onSubmit={(values) => save.mutateAsync(values)} />
        </>
      )}
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
