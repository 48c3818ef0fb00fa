import { StyleSheet, View } from 'react-native';

import { can } from '@/modules/accounts/core/roles';
import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { dayAndTime, deviceLocality, money } from '@/modules/disclosure/ui/disclosure-format';
import { SPACE } from '@/modules/theme/core/palette';
import { Card } from '@/modules/theme/ui/card';
import { FactList } from '@/modules/theme/ui/fact-list';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { usePianoPrice, type PriceMoney } from '../use-piano-money';
import { AskingPriceForm } from './asking-price-form';
import { WorkedFigure } from './worked-figure';

// Staff read times in their own device's locale and zone.
const STAFF_TIME = deviceLocality();

const orNone = (minor: number | null | undefined, currency: string | null | undefined, none: string) => (minor != null && currency ? money(minor, currency) : none);

/** The manager's part of a piano's page: the suggested price worked out, the price set and its history, and the costs. */
export function PricePanel({ pianoId }: { pianoId: number }) {
  const { user } = useSession();
  const allowed = !!user && can(user.role, 'setPrices');
  const { money: data, error } = usePianoPrice(pianoId, !allowed);
  if (!allowed) return null;
  const problem = graphProblem(error);
  if (!data) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the price…" />;
  return (
    <View style={styles.stack} testID="price-panel">
      <Card>
        <Body variant="label" tone="secondary">
          Asking price
        </Body>
        <Body variant="title" testID="price-current">
          {orNone(data.askingPriceMinor, data.priceCurrency, 'No asking price yet')}
        </Body>
        <AskingPriceForm pianoId={pianoId} priceMinor={data.askingPriceMinor} currency={data.priceCurrency} onSaved={() => undefined} savedNote="A published disclosure shows it once published again." />
      </Card>
      {data.suggestedPrice ? (
        <Card testID="price-suggestion">
          <Body variant="subheading">{data.suggestedPrice.basis === 'wholesale' ? 'Wholesale figure' : 'Suggested asking price'}</Body>
          <Body tone="secondary">{data.suggestedPrice.summary}</Body>
          {data.suggestedPrice.provisional ? <Notice tone="caution">Provisional: the inspection did not cover enough areas.</Notice> : null}
          <WorkedFigure lines={data.suggestedPrice.lines} currency={data.suggestedPrice.currency} totalLabel={data.suggestedPrice.basis === 'wholesale' ? 'Wholesale figure' : 'Suggested price'} totalMinor={data.suggestedPrice.priceMinor} testID="price-suggestion-lines" />
          <Body variant="small" tone="secondary">
            {data.suggestedPrice.rounding} Pricing rules {data.suggestedPrice.rulesVersion}.
          </Body>
        </Card>
      ) : null}
      <Costs data={data} />
      <History data={data} />
    </View>
  );
}

function Costs({ data }: { data: PriceMoney }) {
  const c = data.costCurrency;
  if (data.mixedCurrencies) return <Notice tone="caution">This piano’s money is in more than one currency: no cost basis or margin is summed.</Notice>;
  return (
    <Card testID="price-costs">
      <Body variant="subheading">Cost and margin</Body>
      <FactList
        dense
        facts={[
          { label: 'Trade-in allowance', value: orNone(data.allowanceMinor, c, 'None agreed yet') },
          { label: 'Workshop labour so far', value: orNone(data.labourMinor, c ?? data.priceCurrency, '—') },
          { label: 'Parts so far', value: orNone(data.partsMinor, c ?? data.priceCurrency, '—') },
          { label: 'Cost basis', value: orNone(data.costBasisMinor, c, 'Not known until an allowance is agreed') },
          { label: 'Work estimate', value: orNone(data.reconEstimateMinor, c, 'No work plan') },
          { label: 'Expected margin', value: orNone(data.marginMinor, c, 'Needs an asking price and an allowance') },
        ]}
      />
      <Body variant="small" tone="secondary">
        Expected margin: the asking price less the cost basis and the work still estimated on open items.
      </Body>
    </Card>
  );
}

function History({ data }: { data: PriceMoney }) {
  const history = data.priceHistory ?? [];
  return (
    <Card testID="price-history">
      <Body variant="subheading">Price history</Body>
      {history.length ? (
        <View role="list" style={styles.stack}>
          {history.map((h) => (
            <View role="listitem" key={h.id} style={styles.change} testID="price-history-row">
              <Body variant="bodyStrong">
                {h.fromMinor != null ? `${money(h.fromMinor, h.currency)} → ` : ''}
                {money(h.toMinor, h.currency)}
              </Body>
              <Body variant="small" tone="secondary">
                {h.reason} · {h.changedBy ?? 'before price history was kept'}, {dayAndTime(h.changedAt, STAFF_TIME)}
                {h.suggestedMinor != null ? ` · suggested then ${money(h.suggestedMinor, h.currency)}` : ''}
              </Body>
            </View>
          ))}
        </View>
      ) : (
        <Body tone="secondary">No price set yet.</Body>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  stack: { gap: SPACE.md },
  change: { gap: SPACE.xxs },
});
