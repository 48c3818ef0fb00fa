import { StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Body } from '@/modules/theme/ui/text';

import { useBackgroundJobs } from './use-background-jobs';

/** One line on the manager's home: does any background work need a look? */
export function BackgroundWorkPanel() {
  const { jobs, error } = useBackgroundJobs();
  if (!jobs) return error ? <Body tone="quiet">The background work could not be checked just now.</Body> : null;
  const gaveUp = jobs.filter((j) => j.state === 'gave_up').length;
  const text = !jobs.length
    ? 'Refunds, e-mails and hold ends are all going through.'
    : `${jobs.length} ${jobs.length === 1 ? 'job needs' : 'jobs need'} a look${gaveUp ? `, ${gaveUp} out of tries` : ''}.`;
  return (
    <View style={[styles.panel, jobs.length > 0 && styles.attention]} testID="background-panel">
      <Body variant={jobs.length ? 'bodyStrong' : 'body'} tone={gaveUp ? 'danger' : 'default'} style={styles.text}>
        {text}
      </Body>
      <Button label="Background work" variant="secondary" href="/stock/background" testID="background-open" />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.md, padding: SPACE.md, borderRadius: RADIUS.md, borderWidth: 1, borderColor: PALETTE.linen, backgroundColor: PALETTE.vellum },
  attention: { borderColor: PALETTE.brass, borderLeftWidth: 4 },
  text: { flex: 1, minWidth: 200 },
});
