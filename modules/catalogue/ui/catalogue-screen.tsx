import { useEffect, useState } from 'react';
import { Image, StyleSheet, View } from 'react-native';

import type { CatalogueEntry, CataloguePage } from '@/modules/catalogue/core/catalogue';
import { BuyerFrame } from '@/modules/disclosure/ui/components/buyer-frame';
import { money, pianoLine, pianoTitle } from '@/modules/disclosure/ui/disclosure-format';
import type { Loaded } from '@/modules/disclosure/ui/public-disclosure';
import { PIANO_KINDS, type PianoKind } from '@/modules/pianos/core/piano';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { MarkTag } from '@/modules/theme/ui/mark';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Pager } from '@/modules/theme/ui/pager';
import { Body, Heading } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { catalogueSearch, fetchCatalogue, priceLabels, PRICE_BANDS, SIZE_BANDS, SIZE_LABELS, type CatalogueFilters } from './public-catalogue';

const KIND_LABELS: Record<PianoKind, string> = { upright: 'Upright', grand: 'Grand' };
const NO_FILTERS: CatalogueFilters = { kind: null, size: null, price: null, offset: 0 };

/** The public list of pianos on the floor: each as its published disclosure describes it, with its price. */
export function CatalogueScreen() {
  const wide = useWide();
  const [filters, setFilters] = useState<CatalogueFilters>(NO_FILTERS);
  const [answer, setAnswer] = useState<{ search: string; value: Loaded<CataloguePage> } | null>(null);
  const [round, setRound] = useState(0);
  const [currency, setCurrency] = useState('USD');
  const search = catalogueSearch(filters, currency);

  useEffect(() => {
    let live = true;
    fetchCatalogue(search).then((value) => {
      if (!live) return;
      setAnswer({ search, value });
      const priced = value.state === 'ok' ? value.data.pianos.find((p) => p.askingPrice) : null;
      if (priced?.askingPrice) setCurrency(priced.askingPrice.currency);
    });
    return () => {
      live = false;
    };
  }, [search, round]);

  const set = (change: Partial<CatalogueFilters>) => setFilters((f) => ({ ...f, ...change, offset: change.offset ?? 0 }));
  const result = answer?.value;
  const page = result?.state === 'ok' ? result.data : null;

  return (
    <BuyerFrame dealerName={page?.dealerName ?? (result ? null : undefined)} kind="Pianos for sale" documentTitle="Pianos for sale" maxWidth={1200} foot="Every piano here is on the showroom floor today. Its condition disclosure is the full account; the price is the asking price.">
      <View style={styles.intro}>
        <Heading level={1}>Pianos on the floor</Heading>
        <Body tone="secondary">Each piano has a written condition disclosure: what was found when it came in, the work done and what was measured after. A piano held for a buyer or sold leaves this list. Sizes are the height of an upright, the length of a grand.</Body>
      </View>
      <View role="group" aria-label="Filter the pianos" style={[styles.filters, wide && styles.filtersWide]}>
        <View style={wide && styles.filter}>
          <ChoiceGroup label="Kind" options={PIANO_KINDS} labels={KIND_LABELS} value={filters.kind} onChange={(kind) => set({ kind })} onClear={() => set({ kind: null })} testID="catalogue-kind" />
        </View>
        <View style={wide && styles.filter}>
          <ChoiceGroup label="Size" options={SIZE_BANDS} labels={SIZE_LABELS} value={filters.size} onChange={(size) => set({ size })} onClear={() => set({ size: null })} testID="catalogue-size" scroll={!wide} />
        </View>
        <View style={wide && styles.filter}>
          <ChoiceGroup label="Price" options={PRICE_BANDS} labels={priceLabels(currency)} value={filters.price} onChange={(price) => set({ price })} onClear={() => set({ price: null })} testID="catalogue-price" scroll={!wide} />
        </View>
      </View>

      {!result || answer.search !== search ? (
        <Loading label="Finding pianos…" />
      ) : result.state === 'error' ? (
        <Notice tone="error" title="The list did not load" actions={<Button label="Try again" variant="secondary" onPress={() => setRound((r) => r + 1)} />}>
          {result.message}
        </Notice>
      ) : result.state === 'missing' || !page?.pianos.length ? (
        <Notice tone="info" title="No piano on the floor matches" testID="catalogue-none">
          {filters.kind || filters.size || filters.price ? 'Try fewer filters, or come back soon: pianos reach the floor as the workshop finishes them.' : 'Every piano is held or sold just now. Pianos reach the floor as the workshop finishes them.'}
        </Notice>
      ) : (
        <View style={styles.results}>
          <View role="status">
            <Body variant="label" testID="catalogue-count">
              {page.total === 1 ? '1 piano' : `${page.total} pianos`}
            </Body>
          </View>
          <View role="list" style={[styles.grid, wide && styles.gridWide]}>
            {page.pianos.map((p) => (
              <View role="listitem" key={p.token} style={[styles.cell, wide && styles.cellWide]}>
                <PianoCard piano={p} />
              </View>
            ))}
          </View>
          <Pager offset={page.offset} shown={page.pianos.length} total={page.total} pageSize={page.pageSize} noun="pianos" onOffset={(offset) => set({ offset })} testID="catalogue-pager" />
        </View>
      )}
    </BuyerFrame>
  );
}

function PianoCard({ piano }: { piano: CatalogueEntry }) {
  // The catalogue carries no serial number; the disclosure has it.
  const facts = { ...piano, serialNumber: null };
  const title = pianoTitle(facts);
  const worth = piano.areas.filter((a) => a.mark !== 'fine');
  const fine = piano.areas.length - worth.length;
  return (
    <Card style={styles.card} testID={`catalogue-piano-${piano.stockNumber}`} role="group" accessibilityLabel={title}>
      {piano.photo?.url ? (
        <Image source={{ uri: piano.photo.url }} style={styles.photo} accessibilityLabel={piano.photo.caption ?? `Photo of the ${title}`} />
      ) : (
        <View style={styles.noPhoto}>
          <Body variant="small" tone="secondary">
            No photo published yet
          </Body>
        </View>
      )}
      <View style={styles.cardBody}>
        <View>
          <Heading level={2}>{title}</Heading>
          <Body tone="secondary">{pianoLine(facts)}</Body>
          <Body variant="small" tone="quiet">
            {piano.stockNumber}
          </Body>
        </View>
        <Body variant="title" testID="catalogue-price-text">
          {piano.askingPrice ? money(piano.askingPrice.minor, piano.askingPrice.currency) : 'Ask us for the price'}
        </Body>
        <View style={styles.condition}>
          <Body variant="label">Condition, as disclosed</Body>
          <View style={styles.marks}>
            {fine ? <MarkTag mark="fine" label={`Fine: ${fine} of ${piano.areas.length} areas`} /> : null}
            {worth.map((a) => (
              <MarkTag key={a.label} mark={a.mark} label={`${a.label}: ${a.word}`} />
            ))}
          </View>
          {piano.soldAsItStands ? <Body variant="small">Sold as it stands: the work it needs is not done, and the price allows for it.</Body> : null}
          {!piano.soldAsItStands && piano.notDoneCount ? <Body variant="small">{piano.notDoneCount === 1 ? 'One piece of work it calls for is not done: the disclosure says which.' : `${piano.notDoneCount} pieces of work it calls for are not done: the disclosure says which.`}</Body> : null}
        </View>
        <View style={styles.actions}>
          <Button label="Read the condition disclosure" href={`/d/${piano.token}`} testID="catalogue-open" stretch />
          {piano.askingPrice ? <Button label="Hold it with a deposit" variant="secondary" href={`/d/${piano.token}#hold`} testID="catalogue-deposit" stretch /> : null}
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  intro: { gap: SPACE.sm, maxWidth: 760 },
  filters: { gap: SPACE.lg },
  filtersWide: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.xl },
  filter: { flexBasis: 320, flexGrow: 1 },
  results: { gap: SPACE.lg },
  grid: { gap: SPACE.lg },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cell: { width: '100%' },
  cellWide: { width: 'auto', flexBasis: 340, flexGrow: 1, maxWidth: 400 },
  card: { padding: 0, overflow: 'hidden', height: '100%' },
  photo: { width: '100%', aspectRatio: 4 / 3, backgroundColor: PALETTE.linen },
  noPhoto: { minHeight: 48, backgroundColor: PALETTE.linen, alignItems: 'center', justifyContent: 'center', borderTopLeftRadius: RADIUS.md, borderTopRightRadius: RADIUS.md },
  cardBody: { padding: SPACE.lg, gap: SPACE.md, flexGrow: 1 },
  condition: { gap: SPACE.sm },
  marks: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.xs },
  actions: { gap: SPACE.sm, marginTop: 'auto' },
});
