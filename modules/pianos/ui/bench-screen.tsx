import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';
import { Body } from '@/modules/theme/ui/text';
import { Card } from '@/modules/theme/ui/card';

import { PianoListSection } from './piano-list-section';

/** The technician's home: the work queue. Until the workshop part exists it lists the pianos in the workshop stage. */
export function BenchScreen() {
  return (
    <Screen title="Bench" eyebrow="Workshop" headingTestID="home-heading">
      <Card>
        <Body variant="subheading">The work queue is on its way</Body>
        <Body tone="secondary">
          Jobs, their order and their time arrive with the workshop part of Feltwire. Until then this bench lists every piano in the workshop stage.
        </Body>
      </Card>
      <Section title="In the workshop" description="Longest in the workshop first.">
        <PianoListSection
          filter={{ stage: 'in_workshop', order: 'longestInStage' }}
          dateColumn="stageChanged"
          emptyTitle="The bench is clear"
          emptyText="No piano is in the workshop stage right now."
          testID="bench-list"
        />
      </Section>
    </Screen>
  );
}
