import { StyleSheet, View } from 'react-native';
import { NextStepCard } from '../home/next-step-card';
import { ReviewQueueCard } from '../home/review-queue-card';
import { ROLE_INTROS, ROLE_STEPS } from '../home/role-steps';
import { LoadingState } from '../ui/loading-state';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { spacing } from '../../constants/theme';
import { useSessionQuery } from '../../hooks/use-session';
import { ROLE_LABELS } from '../../shared/schemas/auth';
import { useScreenTitle } from '../ui/use-screen-title';

export default function HomeScreen() {
  const { data: user } = useSessionQuery();
  // The (app) layout only renders this once the session is known.
  useScreenTitle(user ? `${ROLE_LABELS[user.role]} home` : 'Home');
  if (!user) return <LoadingState />;

  return (
    <Screen>
      <View style={styles.header}>
        <Text variant="title" headingLevel={1}>
          {ROLE_LABELS[user.role]} home
        </Text>
        <Text variant="bodyStrong">Signed in as {user.name}</Text>
        <Text tone="muted">{ROLE_INTROS[user.role]}</Text>
      </View>
      {user.role === 'admin' ? <ReviewQueueCard /> : null}
      <View style={styles.section}>
        <Text variant="heading" headingLevel={2}>
          What you can do next
        </Text>
        <View style={styles.grid}>
          {ROLE_STEPS[user.role].map((step) => (
            <NextStepCard key={step.title} step={step} />
          ))}
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  header: { gap: spacing.xs },
  section: { gap: spacing.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
