import { StyleSheet, View } from 'react-native';

import { SPACE } from '@/modules/theme/core/palette';

import { Button } from './button';
import { Body } from './text';

interface PagerProps {
  /** the first row shown, from 0 */
  offset: number;
  shown: number;
  total: number;
  pageSize: number;
  onOffset: (offset: number) => void;
  /** what the rows are, plural: "pianos", "items" */
  noun: string;
  busy?: boolean;
  testID?: string;
}

/** "21-40 of 312" with earlier and later pages, for lists the server sends a page at a time. */
export function Pager({ offset, shown, total, pageSize, onOffset, noun, busy, testID }: PagerProps) {
  if (total <= pageSize && offset === 0) return null;
  const first = total ? offset + 1 : 0;
  const last = offset + shown;
  return (
    <View style={styles.row} testID={testID}>
      <Body variant="small" tone="secondary" testID={testID ? `${testID}-range` : undefined}>
        {first.toLocaleString('en-US')}–{last.toLocaleString('en-US')} of {total.toLocaleString('en-US')} {noun}
      </Body>
      <View style={styles.buttons}>
        <Button label="Earlier page" variant="secondary" disabled={offset === 0} busy={busy} onPress={() => onOffset(Math.max(0, offset - pageSize))} testID={testID ? `${testID}-earlier` : undefined} />
        <Button label="Next page" variant="secondary" disabled={last >= total} busy={busy} onPress={() => onOffset(offset + pageSize)} testID={testID ? `${testID}-next` : undefined} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.sm },
  buttons: { flexDirection: 'row', gap: SPACE.sm },
});
