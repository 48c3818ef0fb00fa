import { useCallback, useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { DepositOffer } from '@/modules/deposits/ui/components/deposit-offer';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';

import { readCheckout, readReceipt, readSeen, writeReceipt, writeSeen, type AckReceipt, type SeenVersion } from './buyer-memory';
import { AcknowledgeForm } from './components/acknowledge-form';
import { BuyerFrame } from './components/buyer-frame';
import { DisclosureDocument } from './components/disclosure-document';
import { DocumentRecord } from './components/document-record';
import { longDay, pianoTitle } from './disclosure-format';
import type { PublicDisclosure } from './public-disclosure';
import { usePublicDisclosure } from './use-public-disclosure';

/** The buyer's page behind a disclosure link: read it, acknowledge it, hold the piano with a deposit. */
export function DisclosureScreen({ token, version, checkout = null }: { token: string | null; version: number | null; checkout?: 'cancelled' | null }) {
  const { result, reload } = usePublicDisclosure(token, version);

  if (!token || result?.state === 'missing') return <NoDisclosure />;
  if (!result) {
    return (
      <BuyerFrame kind="Condition disclosure" documentTitle="Condition disclosure">
        <Loading label="Loading the disclosure…" />
      </BuyerFrame>
    );
  }
  if (result.state === 'error') {
    return (
      <BuyerFrame kind="Condition disclosure" documentTitle="Condition disclosure">
        <Notice tone="error" title="The disclosure did not load" actions={<Button label="Try again" variant="secondary" onPress={reload} />}>
          {result.message}
        </Notice>
      </BuyerFrame>
    );
  }
  // Keyed by the link only: a reload after a conflict keeps what the buyer typed and the message about it.
  return <DisclosurePage key={token} token={token} disclosure={result.data} reload={reload} checkout={checkout} />;
}

function DisclosurePage({ token, disclosure, reload, checkout }: { token: string; disclosure: PublicDisclosure; reload: () => void; checkout: 'cancelled' | null }) {
  const c = disclosure.content;
  const [receipt, setReceipt] = useState<AckReceipt | null>(() => readReceipt(token));
  const [paidSession] = useState(() => readCheckout(token));
  // What this device had seen before this visit; read once, so the notice stays while the page is open.
  const [seenBefore] = useState<SeenVersion | null>(() => readSeen(token));

  useEffect(() => {
    if (!seenBefore || seenBefore.version < disclosure.newestVersion) writeSeen(token, { version: disclosure.newestVersion, changedAt: disclosure.changedAt });
  }, [token, seenBefore, disclosure.newestVersion, disclosure.changedAt]);

  const acknowledged = useCallback(
    (r: AckReceipt) => {
      writeReceipt(token, r);
      setReceipt(r);
    },
    [token],
  );

  // The catalogue's "Hold it with a deposit" lands here: the acknowledgement comes first, so go there.
  useEffect(() => {
    if (typeof window !== 'undefined' && window.location?.hash === '#hold') document.getElementById('hold')?.scrollIntoView();
  }, []);

  const updatedSinceSeen = !!seenBefore && seenBefore.version < disclosure.newestVersion && Date.parse(disclosure.changedAt) > Date.parse(seenBefore.changedAt);

  return (
    <BuyerFrame dealerName={c.dealerName} contact={disclosure.dealer.contact} kind="Condition disclosure" documentTitle={`${pianoTitle(c.piano)}: condition disclosure · ${c.dealerName}`}>
      {checkout === 'cancelled' ? (
        <Notice
          tone="info"
          title="The payment was not made"
          testID="checkout-cancelled"
        >
          {`You left the payment page without paying, or your card was declined: nothing was charged and the piano is not held for you. ${disclosure.available ? `You can try again further down this page, with the same card or another, or ask ${c.dealerName} to hold it for you.` : 'The piano is no longer available for a deposit.'}`}
        </Notice>
      ) : null}
      {!disclosure.isNewest ? (
        <Notice
          tone="caution"
          title={`This is version ${disclosure.version}: not the newest`}
          actions={<Button label={`Read version ${disclosure.newestVersion}, the newest`} href={`/d/${token}`} testID="disclosure-newest" />}
          testID="disclosure-old-version"
        >
          {`${c.dealerName} updated this disclosure on ${longDay(disclosure.changedAt, disclosure.dealer)}. This older version is kept so you can see what it said; the newest one is the one that counts.`}
        </Notice>
      ) : updatedSinceSeen ? (
        <Notice tone="info" title={`Updated on ${longDay(disclosure.changedAt, disclosure.dealer)}`} testID="disclosure-updated">
          {`${c.dealerName} changed this disclosure since you last opened it: you are reading version ${disclosure.version}; you last saw version ${seenBefore!.version}. Earlier versions are listed at the end.`}
        </Notice>
      ) : null}

      <DisclosureDocument disclosure={disclosure} />
      <DocumentRecord disclosure={disclosure} token={token} />

      <View nativeID="hold" />
      {disclosure.isNewest ? (
        <AcknowledgeForm token={token} disclosure={disclosure} receipt={receipt} onAcknowledged={acknowledged} onStale={reload} />
      ) : (
        <View role="region" aria-label="Acknowledge" style={styles.section}>
          <Heading level={2}>Acknowledge</Heading>
          <Body tone="secondary">Only the newest version can be acknowledged. Read version {disclosure.newestVersion} first.</Body>
        </View>
      )}
      <DepositOffer token={token} disclosure={disclosure} receipt={receipt} paidSession={paidSession} />
    </BuyerFrame>
  );
}

/** A link that leads nowhere: plain words, no hint whether a piano exists. */
function NoDisclosure() {
  return (
    <BuyerFrame dealerName={null} kind="Condition disclosure" documentTitle="No disclosure at this link">
      <View style={styles.missing} testID="disclosure-missing">
        <Heading level={1}>This link does not lead to a disclosure</Heading>
        <Body tone="secondary">The link may be mistyped or cut short. Check it against the one the dealer gave you, or ask them to send it again.</Body>
      </View>
    </BuyerFrame>
  );
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  missing: { gap: SPACE.md },
});
