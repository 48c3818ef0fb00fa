import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { graphProblem } from '@/modules/accounts/ui/graph-error';
import { SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { EmptyState } from '@/modules/theme/ui/empty-state';
import { Loading, Notice } from '@/modules/theme/ui/notice';
import { Body } from '@/modules/theme/ui/text';

import { PianoList } from './piano-list';
import { COUNT_CAP, PAGE_SIZE, usePianos, type PianoListFilter } from './use-pianos';

interface PianoListSectionProps {
  filter: Omit<PianoListFilter, 'limit' | 'offset'>;
  emptyTitle: string;
  emptyText?: string;
  dateColumn?: 'received' | 'stageChanged';
  /** the first page only, without "Show more" */
  firstPageOnly?: boolean;
  pageSize?: number;
  testID?: string;
}

/** A list of pianos with its loading, error and empty states, growing a page at a time up to the server's cap. */
export function PianoListSection({ filter, emptyTitle, emptyText, dateColumn, firstPageOnly, pageSize = PAGE_SIZE, testID }: PianoListSectionProps) {
  // A new filter starts again from one page; the old rows stay on screen until the new ones arrive.
  const filterKey = `${filter.stage ?? ''}|${filter.maker ?? ''}|${filter.order ?? ''}`;
  const [paging, setPaging] = useState({ filterKey, pages: 1 });
  const pages = paging.filterKey === filterKey ? paging.pages : 1;
  const limit = Math.min(pageSize * pages, COUNT_CAP);
  const { pianos, fetching, error } = usePianos({ ...filter, limit });
  const problem = graphProblem(error);

  if (!pianos) {
    if (problem) return <Notice tone="error">{problem.message}</Notice>;
    return <Loading label="Loading pianos…" />;
  }
  if (pianos.length === 0) {
    return (
      <EmptyState title={emptyTitle} testID={testID ? `${testID}-empty` : undefined}>
        {emptyText}
      </EmptyState>
    );
  }
  const full = pianos.length >= limit;
  return (
    <View style={styles.section}>
      {problem ? <Notice tone="error">{problem.message}</Notice> : null}
      <PianoList pianos={pianos} dateColumn={dateColumn} testID={testID} />
      {!firstPageOnly && full && limit < COUNT_CAP ? (
        <View style={styles.more}>
          <Button label="Show more" variant="secondary" busy={fetching} onPress={() => setPaging({ filterKey, pages: pages + 1 })} />
        </View>
      ) : null}
      {!firstPageOnly && full && limit >= COUNT_CAP ? (
        <Body variant="small" tone="quiet">
          Showing the first {COUNT_CAP}. Pick a stage or a maker to narrow the list.
        </Body>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: SPACE.md },
  more: { alignItems: 'flex-start' },
});
