import { useState } from 'react';
import { StyleSheet, Text, View, type TextStyle } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import { PALETTE, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { openStaffPdf } from '../staff-documents';
import { ExternalLink } from './external-link';
import { QrCode } from './qr-code';

/** The buyer's link on this server: the address their phone opens. */
export function buyerUrl(token: string): string {
  const origin = typeof window !== 'undefined' && window.location ? window.location.origin : '';
  return `${origin}/d/${token}`;
}

interface BuyerLinkPanelProps {
  pianoId: number;
  stockNumber: string;
  token: string;
}

/** The buyer reads on their own phone: a code to scan, the link to copy, and the printed floor tag that carries both. */
export function BuyerLinkPanel({ pianoId, stockNumber, token }: BuyerLinkPanelProps) {
  const { token: session } = useSession();
  const [problem, setProblem] = useState<string | null>(null);
  const [copied, setCopied] = useState(false);
  const [busy, setBusy] = useState(false);
  const url = buyerUrl(token);

  const copy = async () => {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(true);
      setTimeout(() => setCopied(false), 2500);
    } catch {
      setProblem('This browser did not allow copying: select the link and copy it by hand.');
    }
  };
  const tag = async () => {
    setProblem(null);
    setBusy(true);
    setProblem(await openStaffPdf(`/api/pianos/${pianoId}/floor-tag.pdf`, session, `floor-tag-${stockNumber}.pdf`, 'open'));
    setBusy(false);
  };

  return (
    <Card testID="present-buyer-link">
      <View style={styles.row}>
        <QrCode value={url} size={168} label={`QR code for the buyer's link to ${stockNumber}`} testID="present-qr" />
        <View style={styles.text}>
          <Body variant="bodyStrong">Scan to read it on your own phone</Body>
          <Body variant="small" tone="secondary">
            The buyer’s page needs no account. It shows the same disclosure, lets the buyer acknowledge it, and take a deposit.
          </Body>
          <Text selectable style={[TYPE_SCALE.small, URL_STYLE]} testID="present-url">
            {url}
          </Text>
          <View style={styles.buttons}>
            <Button label={copied ? 'Link copied' : 'Copy the link'} variant="secondary" onPress={copy} testID="present-copy-link" />
            <Button label="Print floor tag" variant="secondary" onPress={tag} busy={busy} testID="floor-tag" />
          </View>
          <ExternalLink href={`/d/${token}`} label="Open the buyer’s page" newTab testID="present-open-buyer-page" />
        </View>
      </View>
      {problem ? (
        <Notice tone="error" testID="present-link-problem">
          {problem}
        </Notice>
      ) : null}
    </Card>
  );
}

// a long link wraps anywhere rather than pushing the panel wider (a web-only style)
const URL_STYLE = { color: PALETTE.walnut, wordBreak: 'break-all' } as TextStyle;

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.lg, alignItems: 'flex-start' },
  text: { flex: 1, minWidth: 240, gap: SPACE.sm },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
});
