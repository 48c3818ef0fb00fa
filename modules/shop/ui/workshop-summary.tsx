import { StyleSheet, View } from 'react-native';

import { useCan } from '@/modules/accounts/ui/use-can';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Body, Heading } from '@/modules/theme/ui/text';

import { VarianceTag } from './components/variance-tag';
import { useWorkPlan } from './use-work-plan';
import { formatHours, money } from './work-format';

/**
 * A small panel for the piano page: the workshop plan in one glance (items done, estimate against
 * cost so far) and the way to the piano's workshop page. Floor staff, who do not read plans, see nothing.
 */
export function WorkshopSummary({ pianoId, testID = 'workshop-summary' }: { pianoId: number; testID?: string }) {
  const can = useCan();
  const pause = !can('readWorkCosts');
  const { plan, loaded, error } = useWorkPlan(pause ? null : pianoId);
  if (pause || error || !loaded) return null;
  const bench = can('workAtBench');
  if (!plan) {
    if (!can('planWork')) return null;
    return (
      <Card testID={testID}>
        <Heading level={3}>Workshop</Heading>
        <Body tone="secondary">No reconditioning plan yet.</Body>
        <View style={styles.start}>
          <Button label="Plan the work" variant="secondary" href={`/workshop/pianos/${pianoId}`} testID={`${testID}-open`} />
        </View>
      </Card>
    );
  }
  const done = plan.items.filter((i) => i.status === 'done').length;
  const over = plan.items.filter((i) => i.actualCostMinor > i.estimatedCostMinor);
  const overrun = over.reduce((s, i) => s + i.actualCostMinor - i.estimatedCostMinor, 0);
  const allDone = plan.items.length > 0 && done === plan.items.length;
  return (
    <Card testID={testID}>
      <Heading level={3}>Workshop</Heading>
      <Body>
        {plan.approvedAt ? `${done} of ${plan.items.length} work items done` : `A draft plan of ${plan.items.length} items, not yet approved`}
      </Body>
      <Body variant="small" tone="secondary">
        {money(plan.totals.actualCostMinor, plan.currency)} so far of {money(plan.totals.estimatedCostMinor, plan.currency)} estimated · {formatHours(plan.totals.loggedHours)} of{' '}
        {formatHours(plan.totals.estimatedHours)}
      </Body>
      {allDone ? (
        <View style={styles.line}>
          <VarianceTag varianceMinor={plan.totals.varianceMinor} currency={plan.currency} />
          {over.length ? (
            <Body variant="small" tone="secondary">
              in all; {over.length === 1 ? '1 item' : `${over.length} items`} ran over by {money(overrun, plan.currency)}
            </Body>
          ) : null}
        </View>
      ) : over.length ? (
        <View style={styles.line}>
          <VarianceTag varianceMinor={overrun} currency={plan.currency} />
          <Body variant="small" tone="secondary">
            on {over.length === 1 ? '1 item' : `${over.length} items`} so far
          </Body>
        </View>
      ) : null}
      {bench ? (
        <View style={styles.start}>
          <Button label="Open the workshop page" variant="secondary" href={`/workshop/pianos/${pianoId}`} testID={`${testID}-open`} />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  start: { alignItems: 'flex-start' },
  line: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
});
