import { Redirect, Slot } from 'expo-router';
import { AppShell } from '../../components/nav/app-shell';
import { ErrorBanner } from '../../components/ui/error-banner';
import { LoadingState } from '../../components/ui/loading-state';
import { Screen } from '../../components/ui/screen';
import { messageOf } from '../../hooks/api-client';
import { useSessionQuery, useSignOutMutation } from '../../hooks/use-session';

export default function AppLayout() {
  const session = useSessionQuery();
  const signOut = useSignOutMutation();

  if (session.isPending) return <LoadingState label="Checking your session…" />;
  if (session.isError) {
    return (
      <Screen narrow>
        <ErrorBanner
          title="Dilato could not check your session"
          message={messageOf(session.error)}
          onRetry={() => void session.refetch()}
        />
      </Screen>
    );
  }
  if (!session.data) return <Redirect href="/sign-in" />;

  return (
    <AppShell
      user={session.data}
      signingOut={signOut.isPending}
      // Sign-out clears the session cache, so the redirect above takes over.
      onSignOut={() => signOut.mutate()}
    >
      <Slot />
    </AppShell>
  );
}
