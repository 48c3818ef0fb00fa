import { StyleSheet, Text, View } from 'react-native';

import { AREAS, AREA_LABELS, READINESS_MARKS, READINESS_WORDS, provisionalRule, worstMark, type Area, type Finding, type GradeView } from '@/modules/assessment/core/grade';
import { WORK_TASK_LABELS, type WorkItem } from '@/modules/assessment/core/work-tasks';
import { conditionReport, type AreaReport, type ConditionReport } from '@/modules/shop/core/condition-report';
import { formatMoney } from '@/modules/shop/core/money';
import type { RateCard } from '@/modules/shop/core/rate-card';
import { MARK_LOOKS, PALETTE, RADIUS, SPACE, TYPE_SCALE } from '@/modules/theme/core/palette';
import { MarkShape, MarkTag } from '@/modules/theme/ui/mark';
import { Body } from '@/modules/theme/ui/text';

const hours = (h: number) => `${String(Number(h.toFixed(2)))} h`;

/** One piece of recommended work in words: "Regulation, about 4.5 h" or "or instead: Ease front rail pins (cheaper partial fix)". */
export function describeWork(w: WorkItem): string {
  const extras = [w.hours != null ? `about ${w.hours} h` : '', w.note ?? ''].filter(Boolean);
  const main = `${WORK_TASK_LABELS[w.task]}${extras.length ? ` (${extras.join(', ')})` : ''}`;
  return w.alternativeTo ? `or instead: ${main}` : main;
}

/** The report over the rate card when there is one; hours from the grade alone until it loads. */
function reportOf(grade: GradeView, card: RateCard | null): ConditionReport | null {
  return card ? conditionReport(grade, card) : null;
}

/** The readiness verdict: one of four, with its mark, whether it is provisional, and why. */
export function ReadinessVerdict({ grade, report, testID = 'readiness' }: { grade: GradeView; report: ConditionReport | null; testID?: string }) {
  const mark = READINESS_MARKS[grade.readiness];
  const look = MARK_LOOKS[mark];
  const reasons = report?.reasons ?? [];
  const money = report ? (report.workMinor ? `${hours(report.workHours)} · ${formatMoney(report.workMinor, report.currency)}` : null) : null;
  const workHours = report ? report.workHours : estimateHoursOnly(grade);
  return (
    <View style={[styles.verdict, { borderLeftColor: look.ink }]} testID={testID}>
      <View style={styles.verdictHead}>
        <View style={styles.verdictMark}>
          <MarkShape mark={mark} size={18} />
        </View>
        <Text style={[TYPE_SCALE.heading, { color: look.ink }]} testID={`${testID}-verdict`}>
          {READINESS_WORDS[grade.readiness]}
        </Text>
        {grade.provisional ? <MarkTag mark="unseen" label="Provisional" testID={`${testID}-provisional`} /> : null}
      </View>
      {reasons.map((r) => (
        <Body key={r} variant="small" tone="secondary">
          {r}
        </Body>
      ))}
      {workHours > 0 ? (
        <Body variant="bodyStrong" testID={`${testID}-work`}>
          Work it needs: {money ?? `${hours(workHours)} (money once the rate card loads)`}
        </Body>
      ) : null}
    </View>
  );
}

// Without the rate card the hours still show: each task's own hours where the finding sizes it.
function estimateHoursOnly(grade: GradeView): number {
  return grade.findings.flatMap((f) => f.work.filter((w) => !w.alternativeTo)).reduce((s, w) => s + (w.hours ?? 0), 0);
}

function FindingRow({ finding }: { finding: Finding }) {
  return (
    <View style={styles.finding} role="listitem" testID={`finding-${finding.check}`}>
      <View style={styles.findingHead}>
        <MarkTag mark={finding.mark} />
        {finding.mustDisclose ? (
          <View style={styles.disclose} testID="finding-disclose">
            <Text style={[TYPE_SCALE.badge, styles.discloseText]}>Goes on the disclosure</Text>
          </View>
        ) : null}
      </View>
      <Body>{finding.finding}</Body>
    </View>
  );
}

function AreaWork({ area, report, currency }: { area: AreaReport; report: ConditionReport; currency: ConditionReport['currency'] }) {
  if (!area.lines.length && !area.countedElsewhere.length && !area.options.length) return null;
  return (
    <View style={styles.work} testID={`area-work-${area.area}`}>
      <Body variant="label" tone="secondary">
        Work it needs
      </Body>
      {area.lines.map((l) => (
        <View key={l.task} style={styles.workLine}>
          <Body variant="small" style={styles.grow}>
            {l.label}
            {l.quantity > 1 ? ` × ${l.quantity}` : ''} · {hours(l.hours)}
          </Body>
          <Body variant="small">{formatMoney(l.totalMinor, currency)}</Body>
        </View>
      ))}
      {area.countedElsewhere.map((c) => (
        <Body key={c.task} variant="small" tone="secondary">
          {c.label}: counted under {AREA_LABELS[c.countedIn]}
        </Body>
      ))}
      {area.options.map((o) => (
        <Body key={o.task} variant="small" tone="secondary">
          or instead, a cheaper partial fix not counted: {o.label} · {hours(o.hours)} · {formatMoney(o.totalMinor, currency)}
        </Body>
      ))}
      {area.lines.length > 1 ? (
        <Body variant="small" tone="secondary">
          In this area: {hours(area.hours)} · {formatMoney(area.workMinor, report.currency)}
        </Body>
      ) : null}
    </View>
  );
}

interface ConditionSummaryProps {
  /** the areas' heading level: 2 where the summary stands right under the screen's title */
  areaLevel?: 2 | 3;
  grade: GradeView;
  /** the shop's rate card: the work in money; hours alone while it loads */
  card: RateCard | null;
  /** the areas the user is measuring now: listed first and marked */
  focus?: readonly Area[];
  testID?: string;
}

/** The condition in Feltwire's terms: the verdict, then each area with what was found and the work it needs. */
export function ConditionSummary({ grade, card, focus = [], testID = 'condition', areaLevel = 3 }: ConditionSummaryProps) {
  const report = reportOf(grade, card);
  const areas = [...focus, ...AREAS.filter((a) => !focus.includes(a))];
  return (
    <View style={styles.wrap} testID={testID}>
      <ReadinessVerdict grade={grade} report={report} />
      {grade.referToTechnician ? (
        <View style={styles.flag} testID="flag-technician">
          <MarkShape mark="major" size={12} />
          <Body variant="bodyStrong" tone="danger">
            Refer to a technician
          </Body>
        </View>
      ) : null}

      {areas.map((area) => {
        const findings = grade.findings.filter((f) => f.area === area);
        const inspected = grade.inspectedAreas.includes(area);
        const areaReport = report?.areas.find((a) => a.area === area) ?? null;
        const mark = areaReport?.mark ?? (inspected ? (worstMark(findings.map((f) => f.mark)) ?? 'fine') : 'unseen');
        return (
          <View key={area} style={styles.area} testID={`area-${area}`}>
            <View style={styles.areaHead}>
              <Text role="heading" aria-level={areaLevel} style={[TYPE_SCALE.subheading, styles.areaTitle]}>
                {AREA_LABELS[area]}
                {focus.includes(area) ? <Text style={[TYPE_SCALE.small, styles.focusNote]}> · this step</Text> : null}
              </Text>
              <MarkTag mark={mark} testID={`area-mark-${area}`} />
            </View>
            {inspected ? (
              <View role="list" style={styles.findings}>
                {findings.map((f) => (
                  <FindingRow key={f.check} finding={f} />
                ))}
              </View>
            ) : focus.includes(area) ? (
              <Body tone="secondary">Nothing in this area is measured yet: its findings appear here as you fill in this step.</Body>
            ) : null}
            {areaReport && report ? <AreaWork area={areaReport} report={report} currency={report.currency} /> : null}
          </View>
        );
      })}

      <Body variant="small" tone="quiet">
        Graded with the rules “{grade.rulesVersion}”. {provisionalRule(grade.minInspectedAreas)}
      </Body>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: SPACE.lg },
  verdict: { gap: SPACE.xs, paddingLeft: SPACE.md, paddingVertical: SPACE.xs, borderLeftWidth: 4, borderRadius: RADIUS.sm },
  verdictHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
  verdictMark: { width: 22, height: 22, alignItems: 'center', justifyContent: 'center' },
  flag: { flexDirection: 'row', alignItems: 'center', gap: SPACE.sm },
  area: { gap: SPACE.sm },
  areaHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, paddingBottom: SPACE.xs },
  focusNote: { color: PALETTE.brassShade },
  areaTitle: { color: PALETTE.ebony, flexShrink: 1 },
  findings: { gap: SPACE.md },
  finding: { gap: SPACE.xs },
  findingHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: SPACE.sm },
  disclose: { borderWidth: 1, borderColor: PALETTE.brassShade, borderRadius: 3, paddingHorizontal: SPACE.sm, paddingVertical: 1 },
  discloseText: { color: PALETTE.brassShade },
  work: { gap: SPACE.xxs, paddingLeft: SPACE.md, borderLeftWidth: 2, borderLeftColor: PALETTE.linen },
  workLine: { flexDirection: 'row', gap: SPACE.md },
  grow: { flex: 1, minWidth: 0 },
});
