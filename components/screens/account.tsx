import { StyleSheet, View } from 'react-native';
import { Card } from '../ui/card';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { UnitSwitch } from '../units/unit-switch';
import { spacing } from '../../constants/theme';
import { useSessionQuery } from '../../hooks/use-session';
import { ROLE_LABELS } from '../../shared/schemas/auth';
import { useScreenTitle } from '../ui/use-screen-title';

export default function AccountScreen() {
  const { data: me } = useSessionQuery();
  useScreenTitle('Your settings');
  if (!me) return <LoadingState />;
  return (
    <Screen narrow>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          Your settings
        </Text>
        <Text tone="muted">
          {me.name} · {me.email} · {ROLE_LABELS[me.role]}
        </Text>
      </View>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Units
        </Text>
        <Text tone="muted">
          Temperatures in °C or °F, tube and lengths in mm or inches, mass in kg or lb, stress in MPa or ksi. Saved for you on every device; Dilato keeps its figures in SI either way.
        </Text>
        <UnitSwitch />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
});
