import { useFonts } from 'expo-font';
import { useEffect } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { CatalogueScreen } from '@/modules/catalogue/ui/catalogue-screen';
import { CATALOGUE_PATH } from '@/modules/catalogue/ui/public-catalogue';
import { DepositConfirmationScreen } from '@/modules/deposits/ui/deposit-confirmation-screen';
import { installFocusRing } from '@/modules/theme/ui/focus-ring';
import { FONT_ASSETS } from '@/modules/theme/ui/fonts';

import { CheckScreen } from './check-screen';
import { DisclosureScreen } from './disclosure-screen';
import { parseSession, parseVersion } from './route-params';

export type BuyerPage =
  | { page: 'catalogue' }
  | { page: 'disclosure'; token: string | null; version: number | null; checkout: 'cancelled' | null }
  | { page: 'deposit'; token: string | null; session: string | null }
  | { page: 'check'; code: string | null };

/**
 * Which buyer page an address is: the catalogue (`/pianos-for-sale`), `/d/<token>` (with `?version=`, or `?checkout=cancelled` back from an
 * unpaid checkout), `/d/<token>/deposit` (with `?session=`), or `/check` and `/check/<code>`.
 */
export function buyerPage(pathname: string, search: string): BuyerPage {
  if (pathname.replace(/\/$/, '') === CATALOGUE_PATH) return { page: 'catalogue' };
  const query = new URLSearchParams(search);
  const check = /^\/check(?:\/([^/]+))?\/?$/.exec(pathname);
  if (check) return { page: 'check', code: check[1] ? decodeURIComponent(check[1]) : null };
  const match = /^\/d\/([^/]+)(\/deposit)?\/?$/.exec(pathname);
  const token = match ? decodeURIComponent(match[1]) : null;
  if (match?.[2]) return { page: 'deposit', token, session: parseSession(query.get('session') ?? undefined) };
  return { page: 'disclosure', token, version: parseVersion(query.get('version') ?? undefined), checkout: query.get('checkout') === 'cancelled' ? 'cancelled' : null };
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
      {at.page === 'catalogue' ? (
        <CatalogueScreen />
      ) : at.page === 'deposit' ? (
        <DepositConfirmationScreen token={at.token} sessionId={at.session} />
      ) : at.page === 'check' ? (
        <CheckScreen code={at.code} />
      ) : (
        <DisclosureScreen token={at.token} version={at.version} checkout={at.checkout} />
      )}
    </SafeAreaProvider>
  );
}
