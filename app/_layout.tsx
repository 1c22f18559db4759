import { PublicSans_400Regular } from '@expo-google-fonts/public-sans/400Regular';
import { PublicSans_600SemiBold } from '@expo-google-fonts/public-sans/600SemiBold';
import { PublicSans_700Bold } from '@expo-google-fonts/public-sans/700Bold';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { registerServiceWorker } from '@/components/device/register-service-worker';
import { installFocusStyle } from '@/components/ui/focus-style';
import { colors } from '@/components/ui/theme';

registerServiceWorker();
installFocusStyle();

// Fonts, the query client and the page frame. Navigation decisions live in the group layouts.
export default function RootLayout() {
  const [fontsLoaded] = useFonts({ PublicSans_400Regular, PublicSans_600SemiBold, PublicSans_700Bold });
  const [queryClient] = useState(
    () =>
      new QueryClient({
        // offlineFirst: a query still runs without a connection, so pages kept on the device open.
        defaultOptions: { queries: { retry: 1, refetchOnWindowFocus: true, networkMode: 'offlineFirst' } },
      }),
  );
  if (!fontsLoaded) return <View style={{ flex: 1, backgroundColor: colors.paper }} />;
  return (
    <QueryClientProvider client={queryClient}>
      <View style={{ flex: 1, backgroundColor: colors.paper }}>
        <Slot />
      </View>
    </QueryClientProvider>
  );
}
