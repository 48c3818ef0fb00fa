import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { useEffect } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { SessionProvider } from '@/modules/accounts/ui/session-provider';
import { installFocusRing } from '@/modules/theme/ui/focus-ring';
import { FONT_ASSETS } from '@/modules/theme/ui/fonts';

export default function RootLayout() {
  const [fontsLoaded, fontError] = useFonts(FONT_ASSETS);
  useEffect(() => installFocusRing(), []);
  // A font that fails to load falls back to the system face rather than keeping the page blank.
  if (!fontsLoaded && !fontError) return null;
  return (
    <SafeAreaProvider>
      <SessionProvider>
        <Slot />
      </SessionProvider>
    </SafeAreaProvider>
  );
}
