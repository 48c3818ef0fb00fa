import { useFonts } from 'expo-font';
import { useEffect } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { CatalogueScreen } from '@/modules/catalogue/ui/catalogue-screen';
import { CATALOGUE_PATH } from '@/modules/catalogue/ui/public-catalogue';
import { DepositConfirmationScreen } from '@/modules/deposits/ui/deposit-confirmation-screen';
import { installFocusRing } from '@/modules/theme/ui/focus-ring';
import { FONT_ASSETS } from '@/modules/theme/ui/fonts';

import { DisclosureScreen } from './disclosure-screen';
import { parseSession, parseVersion } from './route-params';

/** Which buyer page an address is: the catalogue, `/d/<token>` (with `?version=`) or `/d/<token>/deposit` (with `?session=`). */
export function buyerPage(pathname: string, search: string): { page: 'catalogue' | 'disclosure' | 'deposit'; token: string | null; version: number | null; session: string | null } {
  if (pathname.replace(/\/$/, '') === CATALOGUE_PATH) return { page: 'catalogue', token: null, version: null, session: null };
  const match = /^\/d\/([^/]+)(\/deposit)?\/?$/.exec(pathname);
  const query = new URLSearchParams(search);
  const token = match ? decodeURIComponent(match[1]) : null;
  return { page: match?.[2] ? 'deposit' : 'disclosure', token, version: parseVersion(query.get('version') ?? undefined), session: parseSession(query.get('session') ?? undefined) };
}

/**
 * The buyer's pages as an app of their own, so a phone that opens a disclosure link downloads these
 * screens only: no staff screens, no router, no session. Links between them are plain page loads.
 */
export function BuyerApp({ pathname, search }: { pathname: string; search: string }) {
  const [fontsLoaded, fontError] = useFonts(FONT_ASSETS);
  useEffect(() => installFocusRing(), []);
  if (!fontsLoaded && !fontError) return null;
  const at = buyerPage(pathname, search);
  return (
    <SafeAreaProvider>
      {at.page === 'catalogue' ? <CatalogueScreen /> : at.page === 'deposit' ? <DepositConfirmationScreen token={at.token} sessionId={at.session} /> : <DisclosureScreen token={at.token} version={at.version} />}
    </SafeAreaProvider>
  );
}
