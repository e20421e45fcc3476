import { useState } from 'react';
import { QueryCache, QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { FontDisplay, useFonts } from 'expo-font';
import { Platform } from 'react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';
import { LoadingState } from '../components/ui/loading-state';
// Read before the router settles the address of a nested screen.
import '../components/auth/opened-url';
// Listens to the browser's Back and Forward before the router does.
import '../components/forms/unsaved-guard';
import { isApiError, shouldRetry } from '../hooks/api-client';
import { sessionKeys } from '../hooks/use-session';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  // Text shows at once in the fallback face and swaps when the shop's face arrives.
  const [fontsLoaded, fontError] = useFonts({
    SourceSans3_400Regular: { uri: SourceSans3_400Regular, display: FontDisplay.SWAP },
    SourceSans3_600SemiBold: { uri: SourceSans3_600SemiBold, display: FontDisplay.SWAP },
    SourceSans3_700Bold: { uri: SourceSans3_700Bold, display: FontDisplay.SWAP },
  });
  // On the web the fonts swap in (above), so the session request and the first screen need not
  // wait for them; on a phone a frame in the wrong face would jump, so the app waits there.
  const ready = fontsLoaded || fontError !== null || Platform.OS === 'web';
  const [queryClient] = useState(() => {
    const client: QueryClient = new QueryClient({
      // A session that ended on the server (expired, or the user was deactivated) shows up as a
      // 401 on any query; forgetting the user sends the (app) layout back to sign-in.
      queryCache: new QueryCache({
        onError: (error) => {
          if (isApiError(error) && error.kind === 'signed_out') client.setQueryData(sessionKeys.me(), null);
        },
      }),
      defaultOptions: {
        queries: { retry: shouldRetry, refetchOnWindowFocus: false },
        mutations: { retry: false },
      },
    });
    return client;
  });

  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <StatusBar style="light" />
        {/* A failed font load falls back to the system font rather than blocking the shop floor. */}
        {ready ? <Slot /> : <LoadingState />}
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
