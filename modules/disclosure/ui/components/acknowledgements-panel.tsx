import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { useSession } from '@/modules/accounts/ui/use-session';
import { PALETTE, RADIUS, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { dayAndTime, deviceLocality } from '../disclosure-format';
import { openStaffPdf } from '../staff-documents';
import { useAcknowledgements, useCountersign, type AcknowledgementRow } from '../use-disclosures';

// Staff read times in their own device's zone: the shop's own tablets and desks.
const STAFF_TIME = deviceLocality();

interface AcknowledgementsPanelProps {
  pianoId: number;
  /** the version buyers read now, to mark acknowledgements of older ones */
  newestVersion: number | null;
}

/** Buyers who acknowledged the disclosure; floor staff countersign, and the signed copy is e-mailed to the buyer. */
export function AcknowledgementsPanel({ pianoId, newestVersion }: AcknowledgementsPanelProps) {
  const { rows, error, refresh } = useAcknowledgements(pianoId);
  const countersign = useCountersign();
  const { token } = useSession();
  const [feedback, setFeedback] = useState<{ id: number; tone: 'success' | 'error'; text: string } | null>(null);
  const [working, setWorking] = useState<number | null>(null);
  const problem = graphProblem(error);

  const sign = async (row: AcknowledgementRow) => {
    setFeedback(null);
    setWorking(row.id);
    const outcome = await countersign.run({ acknowledgementId: row.id });
    setWorking(null);
    if (!outcome.ok) {
      setFeedback({ id: row.id, tone: 'error', text: outcome.problem.message });
    } else {
      setFeedback({ id: row.id, tone: 'success', text: `Countersigned. The signed copy is on its way to ${row.buyerEmail}.` });
    }
    refresh();
  };
  const download = async (row: AcknowledgementRow) => {
    setFeedback(null);
    const failed = await openStaffPdf(`/api/acknowledgements/${row.id}/signed.pdf`, token, `disclosure-signed-${row.id}.pdf`, 'download');
    if (failed) setFeedback({ id: row.id, tone: 'error', text: failed });
  };

  if (!rows) return problem ? <Notice tone="error">{problem.message}</Notice> : <Loading label="Loading acknowledgements…" />;
  return (
    <View style={styles.wrap} testID="present-acknowledgements">
      {rows.length === 0 ? (
        <EmptyState title="No acknowledgements yet">Buyers acknowledge on their own phone, from the QR code or the link: an acknowledgement shows here a few seconds after they send it.</EmptyState>
      ) : (
        <View role="list" style={styles.list}>
          {rows.map((row) => {
            const older = newestVersion != null && row.version < newestVersion;
            return (
              <View role="listitem" key={row.id} style={styles.row} testID={`ack-row-${row.id}`}>
                <View style={styles.who}>
                  <Body variant="bodyStrong">{row.buyerName}</Body>
                  <Body variant="small" tone="secondary" selectable>
                    {row.buyerEmail}
                  </Body>
                  <Body variant="small" tone="secondary">
                    Read version {row.version}
                    {older ? ' (an older version)' : ''} · acknowledged {dayAndTime(row.acknowledgedAt, STAFF_TIME)}
                  </Body>
                  {row.countersignedAt ? (
                    <Body variant="small" tone="success" testID={`ack-signed-${row.id}`}>
                      Countersigned by {row.countersignedBy ?? 'staff'} on {dayAndTime(row.countersignedAt, STAFF_TIME)}; the signed copy goes to the buyer by e-mail.
                    </Body>
                  ) : (
                    <Body variant="small" tone="quiet">
                      Countersigning makes the signed copy and e-mails it to the buyer.
                    </Body>
                  )}
                </View>
                <View style={styles.actions}>
                  {row.countersignedAt ? (
                    row.hasPdf ? (
                      <Button label="Signed copy (PDF)" variant="secondary" onPress={() => download(row)} testID={`signed-pdf-${row.id}`} />
                    ) : null
                  ) : (
                    <Button label="Countersign" onPress={() => sign(row)} busy={working === row.id} disabled={working != null && working !== row.id} testID={`countersign-${row.id}`} />
                  )}
                </View>
                {feedback?.id === row.id ? (
                  <View style={styles.feedback}>
                    <Notice tone={feedback.tone} testID={`ack-feedback-${row.id}`}>
                      {feedback.text}
                    </Notice>
                  </View>
                ) : null}
              </View>
            );
          })}
        </View>
      )}
      <View style={styles.refresh}>
        <Button label="Check for new acknowledgements" variant="quiet" onPress={refresh} testID="present-acks-refresh" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.sm },
  list: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.lg, backgroundColor: PALETTE.vellum, overflow: 'hidden' },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.md, padding: SPACE.lg, borderBottomWidth: 1, borderBottomColor: PALETTE.linen },
  who: { flex: 1, minWidth: 220, gap: SPACE.xxs },
  actions: { flexDirection: 'row', gap: SPACE.sm },
  feedback: { width: '100%' },
  refresh: { flexDirection: 'row' },
});
