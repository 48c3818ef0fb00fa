import { useCallback, useEffect, useState, type ReactNode } from 'react';
import { Modal, StyleSheet, View, useWindowDimensions } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { useCan } from '@/modules/accounts/ui/use-can';
import { DepositsPanel } from '@/modules/deposits/ui/deposits-panel';
import { pianoName } from '@/modules/pianos/core/piano';
import { AskingPriceForm } from '@/modules/pricing/ui/components/asking-price-form';
import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { StageBadge } from '@/modules/theme/ui/stage-badge';
import { Body } from '@/modules/theme/ui/text';

import { AcknowledgementsPanel } from './components/acknowledgements-panel';
import { AreaWalkthrough } from './components/area-walkthrough';
import { BuyerLinkPanel, buyerUrl } from './components/buyer-link-panel';
import { ExternalLink } from './components/external-link';
import { PublishPanel } from './components/publish-panel';
import { QrCode } from './components/qr-code';
import { money } from './disclosure-format';
import type { PublicDisclosure } from './public-disclosure';
import { useDisclosureVersions, usePresentPiano, type PresentPiano } from './use-disclosures';
import { usePublicDisclosure } from './use-public-disclosure';

/** The floor tablet: the disclosure one area at a time for a buyer beside you, and the desk work around it. */
export function PresentScreen({ id }: { id: number | null }) {
  const { user } = useSession();
  const can = useCan();
  if (user && !can('showToBuyers')) {
    return (
      <Screen title="Showing a piano" eyebrow="Floor tablet">
        <Notice tone="info">This view is for floor staff and managers, who show pianos to buyers.</Notice>
      </Screen>
    );
  }
  if (id == null) return <NoPiano />;
  return <PresentView pianoId={id} manager={can('setPrices')} />;
}

function NoPiano() {
  return (
    <Screen title="No such piano" eyebrow="Floor tablet">
      <EmptyState title="This piano is not in stock">The link may be mistyped, or the record is not one you can see.</EmptyState>
      <View style={styles.row}>
        <Button label="All pianos" variant="secondary" href="/pianos" />
      </View>
    </Screen>
  );
}

function PresentView({ pianoId, manager }: { pianoId: number; manager: boolean }) {
  const { piano, loaded, error, refresh: refreshPiano } = usePresentPiano(pianoId);
  const versions = useDisclosureVersions(pianoId);
  const token = versions.data?.token ?? null;
  const { result, reload } = usePublicDisclosure(token, null);
  const [step, setStep] = useState(0);
  const [fullScreen, setFullScreen] = useState(false);
  const { width } = useWindowDimensions();
  const problem = graphProblem(error) ?? graphProblem(versions.error);

  const published = useCallback(() => {
    versions.refresh();
    reload();
  }, [versions, reload]);

  // A sale or a hold changes the stage and whether the buyer's page offers a deposit.
  const depositsChanged = useCallback(() => {
    refreshPiano();
    reload();
  }, [refreshPiano, reload]);

  if (loaded && !piano) return <NoPiano />;
  if (!piano) {
    return (
      <Screen title="Showing a piano" eyebrow="Floor tablet">
        {problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the piano…" />}
      </Screen>
    );
  }

  const disclosure = result?.state === 'ok' ? result.data : null;
  const title = pianoName(piano);
  const twoColumns = width >= 1200;

  const walkthrough = !token ? null : disclosure ? (
    fullScreen ? (
      <Notice tone="info" title="Showing full screen">
        The disclosure is on the whole screen for the buyer.
      </Notice>
    ) : (
      <AreaWalkthrough disclosure={disclosure} step={step} onStep={setStep} closingExtra={token ? <OnYourPhone token={token} /> : null} />
    )
  ) : result?.state === 'error' ? (
    <Notice tone="error" actions={<Button label="Try again" variant="secondary" onPress={reload} />}>
      {result.message}
    </Notice>
  ) : (
    <Loading label="Loading the disclosure…" />
  );

  const phone = token ? (
    <Section key="phone" title="On the buyer’s own phone" description="The same disclosure, to read again at home, acknowledge and hold with a deposit.">
      <BuyerLinkPanel pianoId={pianoId} stockNumber={piano.stockNumber} token={token} />
    </Section>
  ) : null;
  // Nothing to acknowledge before a first version.
  const acks = token ? (
    <Section key="ack" title="Acknowledgements" description="Countersign each one: the signed copy is made and e-mailed to the buyer.">
      <AcknowledgementsPanel pianoId={pianoId} newestVersion={disclosure?.newestVersion ?? versions.data?.versions.at(-1)?.version ?? null} />
    </Section>
  ) : null;
  const sale = (
    <Section key="deposit" title="Deposit and sale">
      <DepositsPanel pianoId={pianoId} onChanged={depositsChanged} />
    </Section>
  );
  // Without a first version the publish panel leads the page instead.
  const publish = token ? (
    <Section key="publish" title="Published versions">
      {versions.data ? <PublishPanel pianoId={pianoId} versions={versions.data} onPublished={published} /> : <Loading label="Loading versions…" />}
    </Section>
  ) : null;
  const managerPart = manager ? <ManagerSection key="manager" piano={piano} onPriceSaved={refreshPiano} /> : null;
  // The buyer's business first: what they signed and what they paid; then the desk's own tools.
  const primary: ReactNode[] = [acks, sale];
  const secondary: ReactNode[] = [phone, publish, managerPart, <DemoInbox key="inbox" />];

  return (
    <Screen
      title={title}
      eyebrow={`Floor tablet · ${piano.stockNumber}`}
      headingTestID="present-heading"
      actions={
        <>
          {disclosure ? <Button label="Full screen for the buyer" onPress={() => setFullScreen(true)} testID="present-fullscreen" /> : null}
          <Button label="Piano record" variant="secondary" href={`/pianos/${pianoId}`} />
        </>
      }
    >
      <View style={styles.summary}>
        <StageBadge stage={piano.stage} testID="present-stage" />
        <Body variant="bodyStrong" testID="present-price">
          {piano.askingPriceMinor != null && piano.priceCurrency ? money(piano.askingPriceMinor, piano.priceCurrency) : 'No asking price yet'}
        </Body>
        {disclosure ? (
          <Body variant="small" tone="secondary">
            Disclosure version {disclosure.version}
          </Body>
        ) : null}
      </View>
      {piano.stage === 'held' ? (
        <Notice tone="caution" title="This piano is held" testID="present-held">
          A buyer’s deposit holds it: it cannot be offered to another buyer until the hold ends or is released.
        </Notice>
      ) : null}
      {token ? walkthrough : (
        <Section title="Disclosure">
          {versions.data ? <PublishPanel pianoId={pianoId} versions={versions.data} onPublished={published} /> : <Loading label="Loading versions…" />}
        </Section>
      )}
      {twoColumns ? (
        <View style={styles.columns}>
          <View style={styles.column}>{primary}</View>
          <View style={styles.column}>{secondary}</View>
        </View>
      ) : (
        [phone, acks, sale, publish, managerPart, <DemoInbox key="inbox" />]
      )}
      {disclosure && token ? <FullScreenWalkthrough open={fullScreen} onClose={() => setFullScreen(false)} disclosure={disclosure} token={token} step={step} onStep={setStep} /> : null}
    </Screen>
  );
}

function ManagerSection({ piano, onPriceSaved }: { piano: PresentPiano; onPriceSaved: () => void }) {
  return (
    <Section title="Manager" description="Only managers see this part.">
      <Card>
        <Body variant="subheading">Asking price</Body>
        <AskingPriceForm pianoId={piano.id} priceMinor={piano.askingPriceMinor} currency={piano.priceCurrency} onSaved={onPriceSaved} />
      </Card>
      <Card>
        <Body variant="subheading">Deposit rules</Body>
        <Body tone="secondary">The share of the price taken as a deposit, the least deposit, how long a hold lasts, and sales tax.</Body>
        <View style={styles.row}>
          <Button label="Set the deposit rules" variant="secondary" href="/present/rules" testID="present-rules-link" />
        </View>
      </Card>
    </Section>
  );
}

/** The local demo inbox exists only on a development server: the link shows when it answers. */
function DemoInbox() {
  const [there, setThere] = useState(false);
  useEffect(() => {
    let live = true;
    fetch('/dev/inbox.json', { method: 'GET', headers: { Accept: 'application/json' } })
      .then((r) => {
        if (live) setThere(r.ok && (r.headers.get('content-type') ?? '').includes('json'));
      })
      .catch(() => undefined);
    return () => {
      live = false;
    };
  }, []);
  if (!there) return null;
  return (
    <View style={styles.inbox}>
      <ExternalLink href="/dev/inbox" label="Demo inbox: see the e-mails Feltwire sent" newTab testID="present-demo-inbox" />
      <Body variant="small" tone="quiet">
        Only on this demonstration server: nothing is really e-mailed.
      </Body>
    </View>
  );
}

interface FullScreenProps {
  open: boolean;
  onClose: () => void;
  disclosure: PublicDisclosure;
  token: string;
  step: number;
  onStep: (step: number) => void;
}

/** What the tablet offers at the end, said plainly: acknowledging and the deposit happen on the buyer's own phone. */
function OnYourPhone({ token }: { token: string }) {
  return (
    <Card testID="present-on-your-phone">
      <View style={styles.closingQr}>
        <QrCode value={buyerUrl(token)} size={150} label="QR code for this disclosure on your own phone" />
        <View style={styles.closingText}>
          <Body variant="subheading">Acknowledge it on your phone</Body>
          <Body>This tablet shows the disclosure. To acknowledge it, and to hold the piano with a deposit if you wish, scan the code with your phone’s camera: the same disclosure opens there, yours to keep.</Body>
        </View>
      </View>
    </Card>
  );
}

/** The walkthrough over the whole screen, staff navigation out of sight, for handing the tablet over. */
function FullScreenWalkthrough({ open, onClose, disclosure, token, step, onStep }: FullScreenProps) {
  const insets = useSafeAreaInsets();
  const narrow = useWindowDimensions().width < 600;
  const c = disclosure.content;
  return (
    <Modal visible={open} animationType="none" onRequestClose={onClose}>
      <View style={[styles.full, { paddingTop: insets.top, paddingBottom: insets.bottom }]} role="dialog" aria-modal aria-label={`Condition disclosure: ${c.piano.maker} ${c.piano.model ?? ''}`}>
        <View style={styles.fullBar}>
          <View style={styles.fullTitles}>
            <Body variant={narrow ? 'bodyStrong' : 'heading'} tone="inverse" numberOfLines={1}>
              {c.dealerName}
            </Body>
            <Body variant="small" style={styles.fullKind}>
              Condition disclosure · version {disclosure.version}
            </Body>
          </View>
          <Button label={narrow ? 'Staff view' : 'Back to the staff view'} variant="secondary" onPress={onClose} testID="present-exit-fullscreen" accessibilityLabel="Back to the staff view" />
        </View>
        <AreaWalkthrough
          disclosure={disclosure}
          step={step}
          onStep={onStep}
          fill
          closingExtra={<OnYourPhone token={token} />}
        />
      </View>
    </Modal>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  summary: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.md },
  columns: { flexDirection: 'row', gap: SPACE.xxl, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: SPACE.xl },
  inbox: { gap: SPACE.xxs, borderTopWidth: 1, borderTopColor: PALETTE.linen, paddingTop: SPACE.md },
  full: { flex: 1, backgroundColor: PALETTE.vellum },
  fullBar: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.md, backgroundColor: PALETTE.felt, paddingHorizontal: SPACE.lg, paddingVertical: SPACE.md, borderBottomWidth: 3, borderBottomColor: PALETTE.brass },
  fullTitles: { flexShrink: 1, gap: SPACE.xxs },
  fullKind: { color: PALETTE.feltLichen },
  closingQr: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.lg },
  closingText: { flex: 1, minWidth: 220, gap: SPACE.xs },
});
