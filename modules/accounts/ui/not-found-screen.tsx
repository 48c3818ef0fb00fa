import { StyleSheet, View } from 'react-native';

import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Screen } from '@/modules/theme/ui/screen';
import { Body } from '@/modules/theme/ui/text';

/** An address that leads nowhere. */
export function NotFoundScreen() {
  return (
    <Screen title="Nothing at this address" eyebrow="Feltwire" width="form">
      <Body tone="secondary">The page may have moved, or the link is mistyped.</Body>
      <View style={styles.buttons}>
        <Button label="Go to my home page" href="/" />
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({ buttons: { flexDirection: 'row', paddingTop: SPACE.sm } });
