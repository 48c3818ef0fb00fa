import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ROLES, ROLE_LABELS, type Role } from '@/modules/accounts/core/roles';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';
import { useWide } from '@/modules/theme/ui/use-wide';

import { graphProblem } from './graph-error';
import { useChangeRole, useSetActive, type TeamMember } from './use-team';

type Mode = 'idle' | 'role' | 'confirmDeactivate';

/** One account: who, what role, whether it can sign in, and the commands a manager has over it. */
export function TeamMemberRow({ member, isSelf }: { member: TeamMember; isSelf: boolean }) {
  const wide = useWide();
  const [mode, setMode] = useState<Mode>('idle');
  const [role, setRole] = useState<Role>(member.role);
  const [problem, setProblem] = useState<string | null>(null);
  const { changeRole, changing } = useChangeRole();
  const { setActive, saving } = useSetActive();

  const saveRole = async () => {
    if (role === member.role) return setMode('idle');
    const result = await changeRole({ userId: member.id, role });
    const p = graphProblem(result.error);
    setProblem(p?.message ?? null);
    if (!p) setMode('idle');
  };

  const cancelRole = () => {
    setRole(member.role);
    setMode('idle');
  };

  const switchActive = async (active: boolean) => {
    const result = await setActive({ userId: member.id, active });
    const p = graphProblem(result.error);
    setProblem(p?.message ?? null);
    if (!p) setMode('idle');
  };

  return (
    <View style={styles.row} testID={`team-member-${member.id}`}>
      <View style={[styles.main, wide && styles.mainWide]}>
        <View style={styles.who}>
          <Body variant="bodyStrong">
            {member.name}
            {isSelf ? <Body variant="small" tone="quiet"> (you)</Body> : null}
          </Body>
          <Body variant="small" tone="secondary" selectable>
            {member.email}
          </Body>
        </View>
        <View style={styles.tags}>
          <Body variant="label" style={styles.roleTag}>
            {ROLE_LABELS[member.role]}
          </Body>
          <Body variant="label" tone={member.active ? 'success' : 'danger'} style={styles.statusTag}>
            {member.active ? 'Can sign in' : 'Deactivated'}
          </Body>
        </View>
        {!isSelf && mode === 'idle' ? (
          <View style={styles.commands}>
            <Button label="Change role" variant="secondary" onPress={() => setMode('role')} accessibilityLabel={`Change role of ${member.name}`} />
            {member.active ? (
              <Button label="Deactivate" variant="quiet" onPress={() => setMode('confirmDeactivate')} accessibilityLabel={`Deactivate ${member.name}`} testID={`deactivate-${member.id}`} />
            ) : (
              <Button label="Reactivate" variant="secondary" busy={saving} onPress={() => switchActive(true)} accessibilityLabel={`Reactivate ${member.name}`} testID={`reactivate-${member.id}`} />
            )}
          </View>
        ) : null}
      </View>

      {problem ? <Notice tone="error">{problem}</Notice> : null}

      {mode === 'role' ? (
        <View style={styles.panel}>
          <ChoiceGroup label={`New role for ${member.name}`} options={ROLES} labels={ROLE_LABELS} value={role} onChange={setRole} testID={`role-choice-${member.id}`} />
          <View style={styles.commands}>
            <Button label="Save role" onPress={saveRole} busy={changing} />
            <Button label="Cancel" variant="quiet" onPress={cancelRole} />
          </View>
        </View>
      ) : null}

      {mode === 'confirmDeactivate' ? (
        <View style={[styles.panel, styles.confirm]} role="alert">
          <Body variant="bodyStrong">Deactivate {member.name}?</Body>
          <Body tone="secondary">They are signed out at once and cannot sign in again until a manager reactivates the account. Their records stay.</Body>
          <View style={styles.commands}>
            <Button label={`Deactivate ${member.name}`} variant="danger" busy={saving} onPress={() => switchActive(false)} testID={`confirm-deactivate-${member.id}`} />
            <Button label="Keep the account" variant="quiet" onPress={() => setMode('idle')} />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: SPACE.md, gap: SPACE.sm },
  main: { gap: SPACE.sm },
  mainWide: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: SPACE.lg, rowGap: SPACE.sm },
  who: { flexGrow: 1, flexBasis: 200, minWidth: 0, gap: SPACE.xxs },
  tags: { flexDirection: 'row', gap: SPACE.sm, alignItems: 'center', flexWrap: 'wrap' },
  roleTag: { ...TYPE_SCALE.label, color: PALETTE.felt, backgroundColor: PALETTE.feltMist, paddingHorizontal: SPACE.sm, paddingVertical: SPACE.xxs, borderRadius: RADIUS.sm },
  statusTag: { paddingVertical: SPACE.xxs },
  commands: { flexDirection: 'row', flexWrap: 'wrap', gap: SPACE.sm },
  panel: { gap: SPACE.md, padding: SPACE.lg, backgroundColor: PALETTE.ivory, borderRadius: RADIUS.md, borderWidth: 1, borderColor: PALETTE.linen },
  confirm: { borderColor: PALETTE.rosewood, borderLeftWidth: 4 },
});
