import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { PALETTE, SPACE } from '@/modules/theme/core/palette';
import { Button } from '@/modules/theme/ui/button';
import { Card } from '@/modules/theme/ui/card';
import { Body, Heading } from '@/modules/theme/ui/text';
import { TextField } from '@/modules/theme/ui/text-field';

import type { NoteView } from '../use-work-item';
import { formatWhen } from '../work-format';
import { Feedback, type FeedbackState } from './feedback';

interface NotesPanelProps {
  notes: readonly NoteView[];
  authorName: (id: number) => string;
  blocked: string | null;
  busy: boolean;
  onAdd: (body: string) => Promise<FeedbackState>;
}

/** What the bench found and did, for the next person and the manager; newest last, as written. */
export function NotesPanel({ notes, authorName, blocked, busy, onAdd }: NotesPanelProps) {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [feedback, setFeedback] = useState<FeedbackState>(null);
  const submit = async () => {
    setFeedback(null);
    if (!body.trim()) {
      setError('Write the note first.');
      return;
    }
    setError(null);
    const outcome = await onAdd(body.trim());
    setFeedback(outcome);
    if (outcome?.tone === 'success') setBody('');
  };
  return (
    <Card role="region" accessibilityLabel="Notes">
      <Heading level={2}>Notes</Heading>
      {notes.length ? (
        <View role="list" testID="notes-list">
          {notes.map((n) => (
            <View role="listitem" key={n.id} style={styles.note}>
              <Body variant="small" tone="quiet">
                {authorName(n.authorId)} · {formatWhen(n.createdAt)}
              </Body>
              <Body>{n.body}</Body>
            </View>
          ))}
        </View>
      ) : (
        <Body tone="secondary">No notes yet.</Body>
      )}
      <TextField label="New note" value={body} onChangeText={setBody} multiline maxLength={2000} error={error} testID="note-body" />
      <Button label="Add the note" variant="secondary" onPress={submit} busy={busy} disabled={!!blocked} stretch testID="note-add" />
      <Feedback state={feedback} testID="note-feedback" />
    </Card>
  );
}

const styles = StyleSheet.create({
  note: { paddingVertical: SPACE.sm, borderBottomWidth: 1, borderBottomColor: PALETTE.linen, gap: SPACE.xxs },
});
