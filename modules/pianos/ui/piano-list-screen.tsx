import { useRouter } from 'expo-router';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useSession } from '@/modules/accounts/ui/use-session';
import { can } from '@/modules/accounts/core/roles';
import { STAGES, STAGE_LABELS, type Stage } from '@/modules/pianos/core/piano';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { ChoiceGroup } from '@/modules/theme/ui/choice-group';
import { Screen } from '@/modules/theme/ui/screen';
import { TextField } from '@/modules/theme/ui/text-field';
import { useWide } from '@/modules/theme/ui/use-wide';

import { PianoListSection } from './piano-list-section';

type StageChoice = Stage | 'all';
const STAGE_CHOICES: readonly StageChoice[] = ['all', ...STAGES];
const CHOICE_LABELS = { all: 'All stages', ...STAGE_LABELS } as Record<StageChoice, string>;

/** Every piano in stock, narrowed by stage (kept in the address) and by maker. */
export function PianoListScreen({ stage }: { stage: Stage | null }) {
  const router = useRouter();
  const wide = useWide();
  const { user } = useSession();
  const [makerInput, setMakerInput] = useState('');
  const [maker, setMaker] = useState('');

  // Ask the server once typing pauses.
  useEffect(() => {
    const timer = setTimeout(() => setMaker(makerInput.trim()), 300);
    return () => clearTimeout(timer);
  }, [makerInput]);

  return (
    <Screen
      title="Pianos"
      eyebrow="Stock"
      actions={user && can(user.role, 'createPianos') ? <Button label="Start a trade-in" variant="secondary" href="/trade-ins/new" /> : null}
    >
      <View style={styles.filters}>
        <View style={wide ? styles.makerWide : undefined}>
          <TextField label="Maker" hint="Part of the name is enough." value={makerInput} onChangeText={setMakerInput} autoCapitalize="none" testID="piano-maker-filter" />
        </View>
        <View style={styles.stages}>
          <ChoiceGroup
            label="Stage"
            options={STAGE_CHOICES}
            labels={CHOICE_LABELS}
            value={stage ?? 'all'}
            onChange={(choice) => router.setParams({ stage: choice === 'all' ? undefined : choice })}
            scroll={!wide}
            testID="piano-stage-filter"
          />
        </View>
      </View>
      <PianoListSection
        filter={{ stage, maker, order: stage ? 'longestInStage' : 'newest' }}
        dateColumn={stage ? 'stageChanged' : 'received'}
        emptyTitle={maker || stage ? 'No piano matches' : 'No pianos yet'}
        emptyText={maker || stage ? 'Try another stage or a shorter part of the maker’s name.' : 'Pianos appear here as soon as intake takes one in.'}
        testID="piano-list"
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  filters: { gap: SPACE.lg },
  makerWide: { maxWidth: 360 },
  stages: { minWidth: 0 },
});
