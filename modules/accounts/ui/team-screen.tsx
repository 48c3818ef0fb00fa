import { StyleSheet, View } from 'react-native';

import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Card } from '@/modules/theme/ui/card';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { useWide } from '@/modules/theme/ui/use-wide';

import { graphProblem } from './graph-error';
import { NewMemberForm } from './new-member-form';
import { TeamMemberRow } from './team-member-row';
import { useSession } from './use-session';
import { useTeam } from './use-team';

/** The manager's list of accounts, with roles and who may sign in, and a form to add someone. */
export function TeamScreen() {
  const wide = useWide();
  return (
    <Screen title="Team" eyebrow="Manager" headingTestID="home-heading">
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={wide ? styles.listColumn : undefined}>
          <Section title="People">
            <TeamList />
          </Section>
        </View>
        <View style={wide ? styles.formColumn : undefined}>
          <Section title="Add a person">
            <Card>
              <NewMemberForm />
            </Card>
          </Section>
        </View>
      </View>
    </Screen>
  );
}

function TeamList() {
  const { user } = useSession();
  const { team, error } = useTeam();
  const problem = graphProblem(error);
  if (!team) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading the team…" />;
  if (team.length === 0) return <EmptyState title="No accounts yet" />;
  // Active accounts first, each group by name.
  const sorted = [...team].sort((a, b) => Number(b.active) - Number(a.active) || a.name.localeCompare(b.name));
  return (
    <Card style={styles.list}>
      {problem ? <Notice tone="error">{problem.message}</Notice> : null}
      <View role="list" testID="team-list">
        {sorted.map((member, index) => (
          <View role="listitem" key={member.id} style={index > 0 ? styles.rule : undefined}>
            <TeamMemberRow member={member} isSelf={member.id === user?.id} />
          </View>
        ))}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  columns: { gap: SPACE.xl },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  listColumn: { flex: 1, minWidth: 0 },
  formColumn: { width: 360 },
  list: { paddingVertical: SPACE.xs, gap: 0 },
  rule: { borderTopWidth: 1, borderTopColor: PALETTE.linen },
});
