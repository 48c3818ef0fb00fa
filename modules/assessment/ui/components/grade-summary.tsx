import { StyleSheet, Text, View } from 'react-native';

import { AREAS, AREA_LABELS, BAND_LABELS, SEVERITY_LABELS, type Area, type Band, type Finding, type Grade, type Severity } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkItem } from '@/modules/assessment/core/work-tasks';
import { PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { Body } from '@/modules/theme/ui/text';

const SEVERITY_INK: Record<Severity, string> = {
  sound: PALETTE.moss,
  watch: PALETTE.brassShade,
  needs_work: PALETTE.rosewood,
  serious: PALETTE.rosewood,
};

const BAND_INK: Record<Band, string> = { excellent: PALETTE.moss, good: PALETTE.felt, fair: PALETTE.brassShade, poor: PALETTE.rosewood };

/** One piece of recommended work in words: "Regulation, about 4.5 h" or "or: Ease front rail pins (cheaper partial fix)". */
export function describeWork(w: WorkItem): string {
  const extras = [w.hours != null ? `about ${w.hours} h` : '', w.note ?? ''].filter(Boolean);
  const main = `${WORK_TASK_LABELS[w.task]}${extras.length ? ` (${extras.join(', ')})` : ''}`;
  return w.alternativeTo ? `or instead: ${main}` : main;
}

/** The severity as a word with a shape beside it, so colour is never the only cue. */
export function SeverityTag({ severity }: { severity: Severity }) {
  const ink = SEVERITY_INK[severity];
  return (
    <View style={styles.tag}>
      <View
        aria-hidden
        style={[
          styles.mark,
          severity === 'sound' && { borderWidth: 2, borderColor: ink, borderRadius: RADIUS.pill },
          severity === 'watch' && { backgroundColor: ink, borderRadius: RADIUS.pill },
          severity === 'needs_work' && { borderWidth: 2, borderColor: ink, borderRadius: 2 },
          severity === 'serious' && { backgroundColor: ink, borderRadius: 2 },
        ]}
      />
      <Text style={[TYPE_SCALE.badge, { color: ink }]}>{SEVERITY_LABELS[severity]}</Text>
    </View>
  );
}

function FindingRow({ finding }: { finding: Finding }) {
  return (
    <View style={styles.finding} role="listitem" testID={`finding-${finding.check}`}>
      <View style={styles.findingHead}>
        <SeverityTag severity={finding.severity} />
        {finding.mustDisclose ? (
          <View style={styles.disclose} testID="finding-disclose">
            <Text style={[TYPE_SCALE.badge, styles.discloseText]}>Goes on the disclosure</Text>
          </View>
        ) : null}
      </View>
      <Body>{finding.finding}</Body>
      {finding.work.length ? (
        <View style={styles.work}>
          <Body variant="label" tone="secondary">
            Recommended work
          </Body>
          {finding.work.map((w) => (
            <Body key={`${w.task}-${w.alternativeTo ?? ''}`} variant="small" tone="secondary">
              • {describeWork(w)}
            </Body>
          ))}
        </View>
      ) : null}
    </View>
  );
}

interface GradeSummaryProps {
  grade: Grade;
  /** testID of the score: grade-score while grading, assessment-score on the piano page */
  scoreTestID: string;
  /** while nothing is measured yet, say so instead of a bare 100 */
  showEmpty?: boolean;
  /** the areas the user is measuring now: listed first and marked */
  focus?: readonly Area[];
}

/** Score, band, flags and the findings by area: the same view while grading and on the piano page. */
export function GradeSummary({ grade, scoreTestID, showEmpty, focus = [] }: GradeSummaryProps) {
  const empty = grade.findings.length === 0;
  // A score of 100 with nothing measured would read as a perfect piano.
  const unmeasured = empty && showEmpty;
  return (
    <View style={styles.wrap}>
      <View style={styles.scoreRow}>
        <View style={styles.scoreBox} accessibilityLabel={unmeasured ? 'Not graded yet' : `Score ${grade.score} of 100, ${BAND_LABELS[grade.band]}`}>
          <Text style={[TYPE_SCALE.display, styles.score]} testID={scoreTestID}>
            {unmeasured ? '–' : grade.score}
          </Text>
          <Body variant="small" tone="quiet">
            of 100
          </Body>
        </View>
        <View style={styles.bandBox}>
          <Text style={[TYPE_SCALE.heading, { color: unmeasured ? PALETTE.pinGrey : BAND_INK[grade.band] }]} testID="grade-band">
            {unmeasured ? 'Not graded yet' : BAND_LABELS[grade.band]}
          </Text>
          {unmeasured ? null : (
            <Body variant="small" tone="quiet">
              {grade.findings.length} {grade.findings.length === 1 ? 'finding' : 'findings'}
            </Body>
          )}
        </View>
      </View>

      {unmeasured ? <Body tone="secondary">Nothing measured yet: findings appear here as you fill in the steps.</Body> : null}

      <View style={styles.flags}>
        {grade.referToTechnician ? (
          <View style={styles.flag} testID="flag-technician">
            <View aria-hidden style={styles.flagMark} />
            <Body variant="bodyStrong" tone="danger">
              Refer to a technician
            </Body>
          </View>
        ) : null}
        {grade.notRecommendedForRetail ? (
          <View style={styles.flag} testID="flag-retail">
            <View aria-hidden style={styles.flagMark} />
            <Body variant="bodyStrong" tone="danger">
              Not recommended for retail as it stands
            </Body>
          </View>
        ) : null}
        {!grade.referToTechnician && !grade.notRecommendedForRetail && !empty ? (
          <Body variant="small" tone="secondary">
            No flags: no technician referral needed, and fit for retail once the work below is done.
          </Body>
        ) : null}
      </View>

      {[...focus, ...AREAS.filter((a) => !focus.includes(a))]
        .filter((a) => grade.findings.some((f) => f.area === a))
        .map((area) => (
          <View key={area} style={styles.area}>
            <Text role="heading" aria-level={3} style={[TYPE_SCALE.subheading, styles.areaTitle]}>
              {AREA_LABELS[area]}
              {focus.includes(area) ? <Text style={[TYPE_SCALE.small, styles.focusNote]}> · this step</Text> : null}
            </Text>
            <View role="list" style={styles.findings}>
              {grade.findings
                .filter((f) => f.area === area)
                .map((f) => (
                  <FindingRow key={f.check} finding={f} />
                ))}
            </View>
          </View>
        ))}

      <Body variant="small" tone="quiet">
        Graded with the rules “{grade.rulesVersion}”.
      </Body>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  scoreRow: { flexDirection: 'row', alignItems: 'center', gap: SPACE.lg },
  scoreBox: { alignItems: 'center', paddingHorizontal: SPACE.md, paddingVertical: SPACE.xs, borderRadius: RADIUS.md, borderWidth: 2, borderColor: PALETTE.brass, minWidth: 84 },
  score: { color: PALETTE.ebony },
  bandBox: { gap: SPACE.xxs, flexShrink: 1 },
  flags: { gap: SPACE.xs },
  flag: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm },
  flagMark: { width: 10, height: 10, backgroundColor: PALETTE.rosewood, transform: [{ rotate: '45deg' }] },
  area: { gap: SPACE.sm },
  focusNote: { color: PALETTE.brassShade },
  areaTitle: { color: PALETTE.ebony, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, paddingBottom: SPACE.xs },
  findings: { gap: SPACE.md },
  finding: { gap: SPACE.xs },
  findingHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
  tag: { flexDirection: 'row', alignItems: 'center', gap: SPACE.xs },
  mark: { width: 10, height: 10 },
  disclose: { borderWidth: 1, borderColor: PALETTE.brassShade, borderRadius: RADIUS.pill, paddingHorizontal: SPACE.sm, paddingVertical: 1 },
  discloseText: { color: PALETTE.brassShade },
  work: { gap: SPACE.xxs, paddingLeft: SPACE.md, borderLeftWidth: 2, borderLeftColor: PALETTE.linen },
});
