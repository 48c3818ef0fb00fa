import { StyleSheet, View } from 'react-native';

import { CAUTION_FOOTER } from '@/modules/shop/core/cautions';
import { SPACE } from '@/modules/theme/core/palette';
import { Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

/** The usual cautions for the task, shown before anything else when an item opens. */
export function CautionsNotice({ cautions, testID }: { cautions: readonly { kind: string; text: string }[]; testID?: string }) {
  if (!cautions.length) return null;
  return (
    <View testID={testID}>
      <Notice tone="caution" title={cautions.length === 1 ? 'Before you start: a caution' : `Before you start: ${cautions.length} cautions`}>
        <View style={styles.list}>
          {cautions.map((c) => (
            <Body key={c.kind} testID={`caution-${c.kind}`}>
              • {c.text}
            </Body>
          ))}
          <Body variant="small" tone="secondary">
            {CAUTION_FOOTER}
          </Body>
        </View>
      </Notice>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: SPACE.sm },
});
