import { useRouter, type Href } from 'expo-router';
import { useEffect, useState } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';

import { ROLE_LABELS, type Role } from '@/modules/accounts/core/roles';
import { LAYOUT, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Notice } from '@/modules/theme/ui/notice';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { BrandMark } from './brand-mark';
import { takeReturnPath } from './session';
import { ROLE_HOME, safeNextPath } from './staff-nav';
import { useSession } from './use-session';

// Demo data from the seeds: invented people on the reserved .test domain.
const DEMO_PASSWORD = 'feltwire-demo';
const DEMO_ACCOUNTS: readonly { email: string; role: Role }[] = [
  { email: 'intake@feltwire.test', role: 'intake' },
  { email: 'tech@feltwire.test', role: 'technician' },
  { email: 'floor@feltwire.test', role: 'floor' },
  { email: 'manager@feltwire.test', role: 'manager' },
];

/** Sign-in; a device already signed in still shows the form, so a colleague can take over the shop tablet. */
export function SignInScreen() {
  const wide = useWide();
  useEffect(() => {
    if (typeof document !== 'undefined') document.title = 'Sign in · Feltwire';
  }, []);

  return (
    <ScrollView style={styles.page} contentContainerStyle={[styles.content, wide && styles.contentWide]}>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View role="banner" style={[styles.intro, wide && styles.introWide]}>
          <View style={styles.brand}>
            <BrandMark size={36} />
            <Text style={[TYPE_SCALE.display, styles.brandText]}>Feltwire</Text>
          </View>
          <Body tone="inverse" style={styles.introText}>
            From trade-in to the showroom floor: every used piano in the shop, its stage, and the work it needs.
          </Body>
        </View>
        <View role="main" style={[styles.formColumn, wide && styles.formColumnWide]}>
          <SignInForm />
          <DemoAccounts />
        </View>
      </View>
    </ScrollView>
  );
}

function SignInForm() {
  const router = useRouter();
  const { user, signIn, endedReason } = useSession();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<{ email?: string; password?: string; form?: string }>({});
  const [busy, setBusy] = useState(false);

  const submit = async () => {
    const missing = {
      email: email.trim() ? undefined : 'Enter your e-mail address.',
      password: password ? undefined : 'Enter your password.',
    };
    if (missing.email || missing.password) {
      setErrors(missing);
      return;
    }
    setBusy(true);
    setErrors({});
    const result = await signIn(email, password);
    setBusy(false);
    if (!result.ok) {
      setErrors({ form: result.message });
      return;
    }
    // Back to the page that sent the visitor here, else "/" which picks the role's home.
    router.replace((safeNextPath(takeReturnPath()) ?? '/') as Href);
  };

  return (
    <Card role="form" accessibilityLabel="Sign in" style={styles.formCard}>
      <Heading level={1} testID="sign-in-heading">
        Sign in
      </Heading>
      {endedReason && !errors.form ? <Notice tone="error">{endedReason}</Notice> : null}
      {user && !busy ? (
        <View style={styles.already}>
          <Body tone="secondary">
            Signed in as {user.name} ({ROLE_LABELS[user.role]}). Sign in below to change to another account.
          </Body>
          <Button label="Carry on as before" variant="secondary" href={ROLE_HOME[user.role]} />
        </View>
      ) : null}
      {errors.form ? (
        <Notice tone="error" testID="sign-in-error">
          {errors.form}
        </Notice>
      ) : null}
      <TextField
        label="E-mail"
        value={email}
        onChangeText={setEmail}
        error={errors.email}
        inputMode="email"
        autoComplete="email"
        autoCapitalize="none"
        testID="sign-in-email"
      />
      <TextField
        label="Password"
        value={password}
        onChangeText={setPassword}
        error={errors.password}
        secureTextEntry
        autoComplete="current-password"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="sign-in-password"
      />
      <Button label="Sign in" onPress={submit} busy={busy} stretch testID="sign-in-submit" />
    </Card>
  );
}

function DemoAccounts() {
  return (
    <View role="region" aria-label="Demo accounts" style={styles.demo}>
      <Text style={[TYPE_SCALE.label, styles.demoTag]}>Demo data</Text>
      <Body variant="small" tone="secondary">
        This copy of Feltwire holds invented demo data. Each role has an account; the password for all four is{' '}
        <Text style={TYPE_SCALE.label}>{DEMO_PASSWORD}</Text>.
      </Body>
      <View style={styles.demoList}>
        {DEMO_ACCOUNTS.map((account) => (
          <View key={account.email} style={styles.demoRow}>
            <Body variant="label" style={styles.demoRole}>
              {ROLE_LABELS[account.role]}
            </Body>
            <Body variant="small" selectable>
              {account.email}
            </Body>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: PALETTE.ivory },
  content: { flexGrow: 1 },
  contentWide: { justifyContent: 'center', padding: SPACE.xxl },
  columns: { width: '100%', maxWidth: 980, alignSelf: 'center' },
  columnsWide: { flexDirection: 'row', borderRadius: RADIUS.lg, overflow: 'hidden', borderWidth: 1, borderColor: PALETTE.linen },
  intro: { backgroundColor: PALETTE.felt, paddingHorizontal: SPACE.lg, paddingTop: SPACE.xxl, paddingBottom: SPACE.xl, gap: SPACE.md, borderBottomWidth: 4, borderBottomColor: PALETTE.brass },
  introWide: { flex: 1, padding: SPACE.xxxl, justifyContent: 'center', borderBottomWidth: 0, borderRightWidth: 4, borderRightColor: PALETTE.brass },
  brand: { flexDirection: 'row', alignItems: 'center', gap: SPACE.md },
  brandText: { color: PALETTE.ivory },
  introText: { maxWidth: 420, color: PALETTE.feltLichen },
  formColumn: { padding: SPACE.lg, gap: SPACE.xl },
  formColumnWide: { flex: 1, maxWidth: LAYOUT.formMaxWidth, padding: SPACE.xxl, backgroundColor: PALETTE.ivory },
  formCard: { gap: SPACE.lg, padding: SPACE.xl },
  already: { gap: SPACE.sm, alignItems: 'flex-start' },
  demo: { gap: SPACE.sm, paddingHorizontal: SPACE.xs },
  demoTag: {
    alignSelf: 'flex-start',
    color: PALETTE.brassShade,
    textTransform: 'uppercase',
    letterSpacing: 1.2,
  },
  demoList: { gap: SPACE.xs, borderLeftWidth: 3, borderLeftColor: PALETTE.brass, paddingLeft: SPACE.md },
  demoRow: { flexDirection: 'row', flexWrap: 'wrap', columnGap: SPACE.md, alignItems: 'baseline' },
  demoRole: { minWidth: 96 },
});
