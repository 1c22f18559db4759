import { PublicSans_400Regular } from '@expo-google-fonts/public-sans/400Regular';
import { PublicSans_600SemiBold } from '@expo-google-fonts/public-sans/600SemiBold';
import { PublicSans_700Bold } from '@expo-google-fonts/public-sans/700Bold';
import { loadAsync } from 'expo-font';
import { useEffect } from 'react';

const FONTS = { PublicSans_400Regular, PublicSans_600SemiBold, PublicSans_700Bold };
let requested = false;

// Public Sans (shipped with the app, never fetched from elsewhere) is requested once the
// first real screen has mounted, so its 87 KB never hold up the sign-in form; until it lands
// the system's sans-serif face stands in (see fonts in theme.ts) and text then swaps.
export function useDeferredFonts() {
  useEffect(() => {
    if (requested) return;
    requested = true;
    const load = () =>
      void loadAsync(FONTS).catch(() => {
        requested = false; // offline at first open: the next screen tries again
      });
    // After the screen's own requests (its data, its code) have gone out.
    const idle = (globalThis as { requestIdleCallback?: (run: () => void, options: { timeout: number }) => number }).requestIdleCallback;
    if (idle) idle(load, { timeout: 1_000 });
    else setTimeout(load, 100);
  }, []);
}
