import { useState } from 'react';
import { QueryCache, QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useFonts } from 'expo-font';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { SourceSans3_400Regular } from '@expo-google-fonts/source-sans-3/400Regular';
import { SourceSans3_600SemiBold } from '@expo-google-fonts/source-sans-3/600SemiBold';
import { SourceSans3_700Bold } from '@expo-google-fonts/source-sans-3/700Bold';
import { LoadingState } from '../components/ui/loading-state';
import { isApiError, shouldRetry } from '../hooks/api-client';
import { sessionKeys } from '../hooks/use-session';

export { ErrorBoundary } from 'expo-router';

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts({
    SourceSans3_400Regular,
    SourceSans3_600SemiBold,
    SourceSans3_700Bold,
  });
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
        {fontsLoaded || fontError ? <Slot /> : <LoadingState />}
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
