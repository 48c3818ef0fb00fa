import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { CODE_MEANING, parseVerificationCode } from '@/modules/disclosure/core/verification';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import { BuyerFrame } from './components/buyer-frame';
import { ExternalLink } from './components/external-link';
import { checkCode, checkedVersionUrl, type CheckOutcome } from './public-disclosure';

const BAD_CODE = 'Type the 12 letters and digits printed on the paper, such as 7K3Q-M9TD-20XF.';

/**
 * The check page: anyone holding a paper types its verification code and sees which published version
 * it belongs to, and can read that version as it was published. No sign-in, no link needed.
 */
export function CheckScreen({ code }: { code: string | null }) {
  const [typed, setTyped] = useState(code ?? '');
  const [error, setError] = useState<string | undefined>(code && !parseVerificationCode(code) ? BAD_CODE : undefined);
  const [outcome, setOutcome] = useState<CheckOutcome | null>(null);
  const [busy, setBusy] = useState(Boolean(code && parseVerificationCode(code)));

  const run = async (value: string) => {
    setOutcome(null);
    if (!parseVerificationCode(value)) {
      setError(BAD_CODE);
      return;
    }
    setError(undefined);
    setBusy(true);
    setOutcome(await checkCode(value));
    setBusy(false);
  };

  // A code in the address (a link from an e-mail or the printed page) is checked at once.
  useEffect(() => {
    if (!code || !parseVerificationCode(code)) return;
    let live = true;
    void checkCode(code).then((found) => {
      if (!live) return;
      setOutcome(found);
      setBusy(false);
    });
    return () => {
      live = false;
    };
  }, [code]);

  return (
    <BuyerFrame dealerName={null} kind="Check a paper" documentTitle="Check a paper’s verification code">
      <View style={styles.block}>
        <Heading level={1}>Check a paper’s verification code</Heading>
        <Body>Every condition disclosure, its printable page and its signed copy carry a verification code at the end of each page.</Body>
        <Body tone="secondary" testID="check-meaning">
          {CODE_MEANING}
        </Body>
      </View>
      <Card role="form" accessibilityLabel="Check a code">
        <TextField label="Verification code" hint="12 letters and digits; dashes and spaces do not matter." value={typed} onChangeText={setTyped} error={error} autoCapitalize="characters" maxLength={40} testID="check-code" />
        <View style={styles.row}>
          <Button label="Check the code" onPress={() => run(typed)} busy={busy} testID="check-submit" />
        </View>
      </Card>
      {outcome ? <CheckAnswer outcome={outcome} /> : null}
      <View style={styles.block}>
        <Heading level={2}>What the check proves, and what it does not</Heading>
        <Body>When the page shows your piano and version, and the published version reads the same as your paper, your paper is that version, word for word.</Body>
        <Body>It does not show who signed: the signatures are on the signed copy the dealer e-mailed to the buyer. And it only finds versions published through Feltwire.</Body>
      </View>
    </BuyerFrame>
  );
}

function CheckAnswer({ outcome }: { outcome: CheckOutcome }) {
  if (!outcome.ok) {
    return (
      <Notice tone="error" title="The code was not checked" testID="check-problem">
        {outcome.message}
      </Notice>
    );
  }
  if (!outcome.versions.length) {
    return (
      <Notice tone="caution" title={`No published version has the code ${outcome.code}`} testID="check-none">
        Compare the code with the paper again: a letter read as another is the usual cause. If it is typed right, this paper is not a version published through Feltwire; ask the dealer who gave it to you.
      </Notice>
    );
  }
  return (
    <View style={styles.block} testID="check-found">
      {outcome.versions.map((v) => (
        <Card key={v.id} testID={`check-version-${v.id}`}>
          <Body variant="label" tone="success">
            The code {outcome.code} belongs to
          </Body>
          <Heading level={2}>{`${v.piano}, stock number ${v.stockNumber}`}</Heading>
          <Body testID="check-version-line">{`Version ${v.version} of the condition disclosure, published by ${v.dealerName} on ${v.publishedOn}.`}</Body>
          {v.version === v.newestVersion ? (
            <Body tone="secondary">This is the newest version.</Body>
          ) : (
            <Notice tone="info" testID="check-newer">{`${v.dealerName} published version ${v.newestVersion} on ${v.newestOn}: the newest one is the one that counts now.`}</Notice>
          )}
          <ExternalLink href={checkedVersionUrl(outcome.code, v.id)} label={`Read version ${v.version} as published`} newTab testID="check-read" />
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  block: { gap: SPACE.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm, paddingTop: SPACE.xs },
});
