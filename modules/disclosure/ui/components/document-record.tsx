import { Platform, StyleSheet, Text, View, type TextStyle } from 'react-native';

import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Card } from '@/modules/theme/ui/card';
import { LinkPressable } from '@/modules/theme/ui/link-pressable';
import { Body, Heading } from '@/modules/theme/ui/text';

import { longDay } from '../disclosure-format';
import { CODE_MEANING } from '@/modules/disclosure/core/verification';

import { checkPageUrl, printableUrl, type PublicDisclosure } from '../public-disclosure';
import { ExternalLink } from './external-link';

const MONO = Platform.select({ web: 'ui-monospace, "SFMono-Regular", Menlo, Consolas, monospace', default: 'monospace' });
const CODE_STYLE = { fontFamily: MONO, fontSize: 20, lineHeight: 28, letterSpacing: 1.5, color: PALETTE.ebony, fontWeight: '700' } as TextStyle;

/** A verification code as printed on the papers, selectable to copy. */
export function VerificationCode({ code, testID }: { code: string; testID?: string }) {
  return (
    <Text selectable style={CODE_STYLE} testID={testID}>
      {code}
    </Text>
  );
}

/** This document's version, its verification code, the printable copy and the older versions. */
export function DocumentRecord({ disclosure, token }: { disclosure: PublicDisclosure; token: string }) {
  const versions = Array.from({ length: disclosure.newestVersion }, (_, i) => disclosure.newestVersion - i);
  return (
    <View role="region" aria-label="This document" style={styles.section}>
      <Heading level={2}>This document</Heading>
      <Card>
        <Body testID="disclosure-version">
          Version {disclosure.version}
          {disclosure.isNewest ? ' (the newest)' : ` of ${disclosure.newestVersion}: not the newest`}, published on {longDay(disclosure.publishedAt, disclosure.dealer)} by {disclosure.content.dealerName}.
        </Body>
        <View style={styles.codeBox}>
          <Body variant="label" tone="secondary">
            Verification code
          </Body>
          <VerificationCode code={disclosure.verificationCode} testID="disclosure-code" />
          <Body variant="small" tone="secondary">
            {CODE_MEANING} The signed copy you are e-mailed carries the same code.
          </Body>
          <ExternalLink href={checkPageUrl(disclosure.verificationCode)} label="Check a paper’s code" testID="disclosure-check-link" />
        </View>
        <ExternalLink href={printableUrl(token, disclosure.version)} label="Printable version" newTab testID="disclosure-printable" />
        {versions.length > 1 ? (
          <View style={styles.versions}>
            <Body variant="label" tone="secondary">
              All versions
            </Body>
            <View role="list" style={styles.versionList}>
              {versions.map((v) => {
                const current = v === disclosure.version;
                const label = `Version ${v}${v === disclosure.newestVersion ? ' (newest)' : ''}`;
                return (
                  <View role="listitem" key={v}>
                    {current ? (
                      <View style={[styles.versionChip, styles.versionCurrent]} aria-current="page">
                        <Text style={[TYPE_SCALE.label, styles.versionCurrentText]}>{label}: shown</Text>
                      </View>
                    ) : (
                      <LinkPressable
                        href={v === disclosure.newestVersion ? `/d/${token}` : `/d/${token}?version=${v}`}
                        testID={`disclosure-version-${v}`}
                        style={({ hovered }) => [styles.versionChip, styles.versionLink, hovered && styles.versionHover]}
                      >
                        <Text style={[TYPE_SCALE.label, styles.versionLinkText]}>{label}</Text>
                      </LinkPressable>
                    )}
                  </View>
                );
              })}
            </View>
          </View>
        ) : null}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  codeBox: { gap: SPACE.xs, padding: SPACE.md, borderRadius: RADIUS.md, backgroundColor: PALETTE.ivory, borderWidth: 1, borderColor: PALETTE.linen },
  versions: { gap: SPACE.xs },
  versionList: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  versionChip: { minHeight: 44, paddingHorizontal: SPACE.md, borderRadius: RADIUS.md, borderWidth: 1.5, justifyContent: 'center', alignItems: 'center' },
  versionLink: { borderColor: PALETTE.felt, backgroundColor: PALETTE.vellum },
  versionHover: { backgroundColor: PALETTE.feltMist },
  versionLinkText: { color: PALETTE.felt },
  versionCurrent: { borderColor: PALETTE.felt, backgroundColor: PALETTE.felt },
  versionCurrentText: { color: PALETTE.ivory },
});
