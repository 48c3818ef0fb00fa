import { Screen } from '@/modules/theme/ui/screen';
import { Section } from '@/modules/theme/ui/section';

import { PianoListSection } from './piano-list-section';

/** The floor's home: the pianos out on the showroom floor. */
export function ShowroomScreen() {
  return (
    <Screen title="Showroom" eyebrow="Floor" headingTestID="home-heading">
      <Section title="On the floor" description="Pianos a buyer can see and play, by stock number.">
        <PianoListSection
          filter={{ stage: 'on_floor', order: 'stockNumber' }}
          dateColumn="stageChanged"
          emptyTitle="The floor is empty"
          emptyText="No piano is on the floor yet. Pianos show here once the workshop has finished with them and they are put out."
          testID="showroom-list"
        />
      </Section>
    </Screen>
  );
}
