// The discussion under a shared sketch: oldest first, my own editable and removable, anyone's
// removable by owners and admins; viewers read only.
import { useState } from 'react';
import { StyleSheet, Text, TextInput, View } from 'react-native';
import type { Comment } from '@/shared/api/comments';
import type { LocalComment } from '@/lib/store/types';
import { useAddComment, useDeleteComment, useEditComment, useUnsentComments } from '@/hooks/queries/useFeed';
import { useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { useSession } from '@/hooks/useSession';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, fonts, radius, space, type } from '@/constants/theme';
import { CommentText } from './CommentText';
import { useCommentDrafts } from './draft-store';
import { when } from '@/lib/when';

/**
 * `field` names the text box, `label` its button: two names, so each can be found by its own.
 * What is typed lives in the draft store under `draft`, so a remount (the page refetching, the
 * window crossing the two-column width) keeps it; `onSubmit` gets a `done` that ends the draft.
 */
function Composer({ draft, initial = '', field, label, busy, onSubmit, onCancel }: { draft: string; initial?: string; field: string; label: string; busy: boolean; onSubmit: (body: string, done: () => void) => void; onCancel?: () => void }) {
  const body = useCommentDrafts((s) => s.drafts[draft]) ?? initial;
  const { setDraft, clearDraft } = useCommentDrafts.getState();
  const done = () => clearDraft(draft);
  return (
    <View style={styles.composer}>
      <TextInput value={body} onChangeText={(b) => setDraft(draft, b)} multiline aria-label={field} placeholder="Write a comment: Markdown, maths between $…$"
        placeholderTextColor={colors.inkFaint} style={styles.input} />
      <View style={styles.row}>
        <Button label={label} busy={busy} busyLabel="Saving…" disabled={!body.trim()} onPress={() => onSubmit(body, done)} />
        {onCancel ? <Button variant="quiet" label="Cancel" onPress={() => { done(); onCancel(); }} /> : null}
      </View>
    </View>
  );
}

function Item({ c, groupId, mine, moderate, canWrite }: { c: Comment; groupId: string; mine: boolean; moderate: boolean; canWrite: boolean }) {
  const [editing, setEditing] = useState(false);
  const edit = useEditComment(groupId);
  const remove = useDeleteComment(groupId);
  return (
    <View style={styles.item}>
      <Text style={styles.meta}>
        <Text style={styles.author}>{c.author.displayName}</Text> · {when(c.createdAt)}{c.editedAt ? ' · edited' : ''}
      </Text>
      {editing ? (
        <Composer draft={`edit:${c.id}`} initial={c.body} field="Edit comment" label="Save" busy={edit.isPending} onCancel={() => setEditing(false)}
          onSubmit={(body, done) => edit.mutate({ id: c.id, body }, { onSuccess: () => { done(); setEditing(false); } })} />
      ) : (
        <CommentText body={c.body} />
      )}
      {!editing && (mine || moderate) ? (
        <View style={styles.actions}>
          {mine && canWrite ? <Text role="button" style={styles.action} onPress={() => setEditing(true)}>Edit</Text> : null}
          <Text role="button" style={[styles.action, styles.danger]} onPress={() => remove.mutate(c.id)}>{mine ? 'Delete' : 'Remove'}</Text>
        </View>
      ) : null}
      {edit.error || remove.error ? <Banner tone="error">{(edit.error ?? remove.error)!.message}</Banner> : null}
    </View>
  );
}

/** A comment still on this device (S34): sent by the next sync, or refused with the reason. */
function Unsent({ c, author }: { c: LocalComment; author: string }) {
  const { discardComment } = useSketchWrites();
  return (
    <View style={styles.item} testID="unsent-comment">
      <Text style={styles.meta}>
        <Text style={styles.author}>{author}</Text> · {c.state === 'waiting' ? <Text style={styles.waiting}>Waiting to send</Text> : <Text style={styles.refused}>Not sent: {c.reason}</Text>}
      </Text>
      <CommentText body={c.body} />
      {c.state === 'rejected' ? (
        <View style={styles.actions}>
          <Text role="button" aria-label="Discard unsent comment" style={[styles.action, styles.danger]} onPress={() => discardComment.mutate(c)}>Discard</Text>
        </View>
      ) : null}
      {discardComment.error ? <Banner tone="error">{discardComment.error.message}</Banner> : null}
    </View>
  );
}

export function Comments({ groupId, sketchId, comments, canComment, moderate }: { groupId: string; sketchId: string; comments: Comment[]; canComment: boolean; moderate: boolean }) {
  const me = useSession((s) => s.user);
  const add = useAddComment(groupId, sketchId);
  const unsent = useUnsentComments(groupId, sketchId).filter((c) => !comments.some((s) => s.id === c.id));
  return (
    <View style={styles.wrap}>
      {comments.length + unsent.length === 0 ? <Text style={styles.muted}>No comments yet.</Text> : null}
      {comments.map((c) => <Item key={c.id} c={c} groupId={groupId} mine={c.author.id === me?.id} moderate={moderate} canWrite={canComment} />)}
      {unsent.map((c) => <Unsent key={c.id} c={c} author={me?.displayName ?? 'Me'} />)}
      {add.error ? <Banner tone="error">{add.error.message}</Banner> : null}
      {canComment ? (
        <Composer draft={`new:${sketchId}`} field="Comment" label="Post comment" busy={add.isPending} onSubmit={(body, done) => add.mutate(body, { onSuccess: done })} />
      ) : (
        <Text style={styles.muted}>Viewers read the discussion; ask an admin to make you a member to comment.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  item: { gap: 4, paddingBottom: space.md, borderBottomWidth: 1, borderBottomColor: colors.line },
  meta: { ...type.small, color: colors.inkMuted },
  author: { fontFamily: fonts.medium, color: colors.ink },
  actions: { flexDirection: 'row', gap: space.sm },
  // A 44 px tall target around the 18 px line (touch targets, issue of the phone layout).
  action: { ...type.label, color: colors.accent, minHeight: 44, minWidth: 44, paddingVertical: 13 },
  danger: { color: colors.danger },
  waiting: { fontFamily: fonts.medium, color: colors.inkFaint },
  refused: { fontFamily: fonts.medium, color: colors.danger },
  composer: { gap: space.sm },
  input: { minHeight: 88, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface, fontFamily: fonts.regular, fontSize: 16, color: colors.ink, textAlignVertical: 'top' },
  row: { flexDirection: 'row', gap: space.sm },
  muted: { ...type.small, color: colors.inkMuted },
});
