import { useRouter } from 'expo-router';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useCan } from '@/modules/accounts/ui/use-can';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';

import { DEALER_TEMPLATE_ADVICE } from '@/modules/disclosure/core/disclosure';

import { DepositRulesForm } from './deposit-rules-form';
import { useDepositRules } from './use-deposits';

/** A manager's page for the deposit rules: share of the price, least deposit, hold, sales tax. */
export function DepositRulesScreen() {
  const allowed = useCan()('manageDeposits');
  const router = useRouter();
  const { rules, error } = useDepositRules();
  // Back to the piano the manager came from; a page opened directly goes to the manager's home.
  const back = () => (router.canGoBack() ? router.back() : router.replace('/stock'));
  const problem = graphProblem(error);
  if (!allowed) {
    return (
      <Screen title="Deposit rules" eyebrow="Deposits" width="form">
        <Notice tone="info">Only a manager sets the deposit rules.</Notice>
      </Screen>
    );
  }
  return (
    <Screen title="Deposit rules" eyebrow="Deposits" width="form" headingTestID="rules-heading" actions={<Button label="Back" variant="secondary" onPress={back} testID="rules-back" />}>
      <Notice tone="caution" title="Templates, not legal advice" testID="rules-legal">
        {`The deposit terms buyers read follow from these rules. ${DEALER_TEMPLATE_ADVICE} This advice is for you: buyers never see it.`}
      </Notice>
      {rules ? (
        <Card>
          <DepositRulesForm rules={rules} />
        </Card>
      ) : problem ? (
        <Notice tone="error">{problem.message}</Notice>
      ) : (
        <Loading label="Loading the rules…" />
      )}
    </Screen>
  );
}
