import { Redirect, Slot, usePathname } from 'expo-router';
import { useState } from 'react';
import { Platform } from 'react-native';
import { takeOpenedUrl } from '../../components/auth/opened-url';
import { signInHref } from '../../components/auth/next-path';
import { AppShell } from '../../components/nav/app-shell';
import { ErrorBanner } from '../../components/ui/error-banner';
import { LoadingState } from '../../components/ui/loading-state';
import { Screen } from '../../components/ui/screen';
import { messageOf } from '../../hooks/api-client';
import { useSessionQuery, useSignOutMutation } from '../../hooks/use-session';

export default function AppLayout() {
  const session = useSessionQuery();
  const signOut = useSignOutMutation();
  const pathname = usePathname();
  // The address the app was opened at, used only if the first thing this layout does is ask for sign-in.
  const [firstUrl, setFirstUrl] = useState(takeOpenedUrl);
  if (session.data && firstUrl) setFirstUrl(null);

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
  // A link opened while signed out comes back after sign-in (sign-out goes home, not back).
  if (!session.data) return <Redirect href={!signOut.isIdle ? '/sign-in' : signInHref(firstUrl ?? openedPath(pathname))} />;

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


/** The path the person opened, with its query on the web (a compare link carries its alloys there). */
function openedPath(pathname: string): string {
  return Platform.OS === 'web' && typeof window !== 'undefined' ? `${window.location.pathname}${window.location.search}` : pathname;
}
