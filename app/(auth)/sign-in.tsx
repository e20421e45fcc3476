import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';
import { SignInForm } from '../../components/auth/sign-in-form';
import { Card } from '../../components/ui/card';
import { Screen } from '../../components/ui/screen';
import { Text } from '../../components/ui/text';
import { colors, radii, spacing } from '../../constants/theme';
import { isApiError, messageOf } from '../../hooks/api-client';
import { useSignInMutation } from '../../hooks/use-session';
import { useScreenTitle } from '../../components/ui/use-screen-title';
import { loadScreens } from '../../components/screens/lazy-screen';

/** Once the form is up, the signed-in screens are fetched in the background, so signing in opens the home at once. */
const PREFETCH_AFTER_MS = 800;

export default function SignInScreen() {
  const signIn = useSignInMutation();
  const error = signIn.error;
  // Field-level problems go under their fields; anything else is one message above the form.
  const serverFields = isApiError(error) && error.kind === 'invalid' ? error.fields : undefined;
  const hasFieldErrors = serverFields && Object.keys(serverFields).length > 0;
  const failure = error && !hasFieldErrors ? messageOf(error) : undefined;

  useScreenTitle('Sign in');
  useEffect(() => {
    const timer = setTimeout(() => loadScreens().catch(() => undefined), PREFETCH_AFTER_MS);
    return () => clearTimeout(timer);
  }, []);
  return (
    <Screen narrow>
      <View style={styles.brand}>
        <View style={styles.heatBand} aria-hidden>
          <View style={[styles.heatStop, styles.straw]} />
          <View style={[styles.heatStop, styles.bronze]} />
          <View style={[styles.heatStop, styles.blue]} />
        </View>
        <Text variant="display" headingLevel={1}>
          Dilato
        </Text>
        <Text tone="muted">
          Alloy data and thermal-expansion sizing for the shop that builds hot-section pipework.
        </Text>
      </View>
      <Card>
        <Text variant="heading" headingLevel={2}>
          Your shop account
        </Text>
        <SignInForm
          onSubmit={(values) => signIn.mutate(values)}
          submitting={signIn.isPending}
          failure={failure}
          serverFields={serverFields}
          onEdit={() => {
            if (signIn.error) signIn.reset();
          }}
        />
      </Card>
      <Text variant="caption" tone="muted">
        Accounts are set up by your shop&apos;s Dilato admin. Ask them if you need one or have lost your password.
      </Text>
    </Screen>
  );
}

const styles = StyleSheet.create({
  brand: { gap: spacing.sm, paddingTop: spacing.xxl },
  heatBand: { flexDirection: 'row', height: 6, width: 96, borderRadius: radii.pill, overflow: 'hidden' },
  heatStop: { flex: 1 },
  straw: { backgroundColor: colors.accent },
  bronze: { backgroundColor: colors.warning },
  blue: { backgroundColor: colors.primary },
});
