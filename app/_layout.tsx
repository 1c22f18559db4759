import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Slot } from 'expo-router';
import { useState } from 'react';
import { View } from 'react-native';

import { registerServiceWorker } from '@/components/device/register-service-worker';
import { installFocusStyle } from '@/components/ui/focus-style';
import { colors } from '@/components/ui/theme';

registerServiceWorker();
installFocusStyle();

// The query client and the page frame; fonts load with the first screen (ui/deferred-fonts).
// Navigation decisions live in the group layouts.
export default function RootLayout() {
  const [queryClient] = useState(
    () =>
      new QueryClient({
        // offlineFirst: a query still runs without a connection, so pages kept on the device open.
        defaultOptions: { queries: { retry: 1, refetchOnWindowFocus: true, networkMode: 'offlineFirst' } },
      }),
  );
  return (
    <QueryClientProvider client={queryClient}>
      <View style={{ flex: 1, backgroundColor: colors.paper }}>
        <Slot />
      </View>
    </QueryClientProvider>
  );
}
