import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Button } from '@/modules/theme/ui/button';

import { PianoListSection } from './piano-list-section';

/** Intake's home: start a trade-in, and the pianos taken in that nobody has assessed yet. */
export function TradeInsScreen() {
  return (
    <Screen
      title="Trade-ins"
      eyebrow="Intake"
      headingTestID="home-heading"
      actions={<Button label="Start a trade-in" href="/trade-ins/new" testID="start-trade-in" />}
    >
      <Section title="Recent intakes" description="Pianos taken in and waiting for their assessment, newest first.">
        <PianoListSection
          filter={{ stage: 'received', order: 'newest' }}
          emptyTitle="Nothing waiting at intake"
          emptyText="A piano you take in shows here until it has been assessed."
          pageSize={20}
          testID="recent-intakes"
        />
      </Section>
    </Screen>
  );
}
