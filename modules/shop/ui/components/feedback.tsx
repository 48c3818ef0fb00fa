import { Notice } from '@/modules/theme/ui/notice';

export type FeedbackState = { tone: 'error' | 'success'; text: string } | null;

/** What the last command of a panel did, right under its buttons where the thumb is. */
export function Feedback({ state, testID }: { state: FeedbackState; testID?: string }) {
  if (!state) return null;
  return (
    <Notice tone={state.tone} testID={testID}>
      {state.text}
    </Notice>
  );
}
