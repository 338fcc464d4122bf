// A sketch's details: title, where it was seen, notes, tags, times, and board photos (camera or
// a file; kept on the device until the sync uploads them).
import { useEffect, useRef, useState } from 'react';
import { Image, StyleSheet, Text, View } from 'react-native';
import * as ImagePicker from 'expo-image-picker';
import type { LocalSketch } from '@/lib/store/types';
import { useDevice } from '@/hooks/useDevice';
import { useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { Button } from '@/components/ui/Button';
import { Banner } from '@/components/ui/Banner';
import { Dialog } from '@/components/ui/Dialog';
import { Field } from '@/components/ui/Field';
import { tagsFrom } from '@/shared/api/tags';
import { colors, radius, space, type } from '@/constants/theme';

const time = (iso: string) => new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });

function bytesOf(base64: string): Uint8Array {
  const s = atob(base64);
  return Uint8Array.from(s, (c) => c.charCodeAt(0));
}

export function SketchDetails({ sketch, visible, onClose }: { sketch: LocalSketch; visible: boolean; onClose: () => void }) {
  const device = useDevice();
  const { update } = useSketchWrites();
  const [title, setTitle] = useState(sketch.title);
  const [seenAt, setSeenAt] = useState(sketch.seenAt);
  const [notes, setNotes] = useState(sketch.notes);
  const [tags, setTags] = useState(sketch.tags.join(', '));
  const [photos, setPhotos] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);

  // The fields start from the record each time the dialog opens, not on every save of it.
  const stored = useRef(sketch);
  stored.current = sketch;
  useEffect(() => {
    if (!visible) return;
    const s = stored.current;
    setTitle(s.title);
    setSeenAt(s.seenAt);
    setNotes(s.notes);
    setTags(s.tags.join(', '));
  }, [visible]);

  // Photos still on this device are shown from their local copy.
  useEffect(() => {
    if (!visible || !device) return;
    void device.store.pendingUploads().then((ups) => setPhotos(Object.fromEntries(ups.map((u) => [u.sha256, `data:${u.mimeType};base64,${u.base64}`]))));
  }, [visible, device, sketch.attachments]);

  const save = () =>
    update.mutate({ id: sketch.id, patch: { title: title.trim(), seenAt: seenAt.trim(), notes, tags: tagsFrom(tags) } }, { onSuccess: onClose, onError: (e) => setError(e.message) });

  const addPhoto = async (from: 'camera' | 'library') => {
    setError(null);
    try {
      if (from === 'camera' && !(await ImagePicker.requestCameraPermissionsAsync()).granted) return setError('The camera was not allowed; choose a file instead.');
      const options: ImagePicker.ImagePickerOptions = { mediaTypes: ['images'], base64: true, quality: 0.8 };
      const r = from === 'camera' ? await ImagePicker.launchCameraAsync(options) : await ImagePicker.launchImageLibraryAsync(options);
      const asset = r.canceled ? null : r.assets[0];
      if (!asset?.base64 || !device) return;
      const sha = await device.store.queueUpload(bytesOf(asset.base64), asset.mimeType ?? 'image/jpeg');
      if (!sketch.attachments.includes(sha)) update.mutate({ id: sketch.id, patch: { attachments: [...sketch.attachments, sha] } });
    } catch (e) {
      setError(e instanceof Error ? e.message : String(e));
    }
  };

  return (
    <Dialog title="Sketch details" visible={visible} onClose={onClose} wide>
      <Field label="Title" value={title} onChangeText={setTitle} placeholder="Trefoil from the colloquium" />
      <Field label="Where it was seen" value={seenAt} onChangeText={setSeenAt} placeholder="Topology seminar, room 2" />
      <Field label="Notes" value={notes} onChangeText={setNotes} multiline placeholder="What the speaker claimed about it…" />
      <Field label="Tags" value={tags} onChangeText={setTags} hint="Separated by commas" placeholder="knot, torus" autoCapitalize="none" />
      <View style={styles.photos}>
        <Text style={styles.label}>Board photos</Text>
        <View style={styles.strip}>
          {sketch.attachments.map((sha, i) => (
            <View key={sha} style={styles.item}>
              {photos[sha] ? (
                <Image source={{ uri: photos[sha] }} style={styles.photo} accessibilityLabel="Board photo" />
              ) : (
                <View style={[styles.photo, styles.uploaded]}><Text style={styles.small}>uploaded</Text></View>
              )}
              <Text role="button" aria-label={`Remove board photo ${i + 1}`} style={styles.remove}
                onPress={() => update.mutate({ id: sketch.id, patch: { attachments: sketch.attachments.filter((h) => h !== sha) } })}>Remove</Text>
            </View>
          ))}
        </View>
        <View style={styles.row}>
          <Button variant="secondary" label="Take a photo" onPress={() => void addPhoto('camera')} />
          <Button variant="secondary" label="Choose a file" onPress={() => void addPhoto('library')} />
        </View>
        <Text style={styles.small}>Photos stay on this device until the sketchbook syncs. Removing one here takes it out of the group feed too.</Text>
      </View>
      <Text style={styles.small}>Created {time(sketch.createdAt)} · edited {time(sketch.updatedAt)}</Text>
      {error ? <Banner tone="error">{error}</Banner> : null}
      <View style={styles.row}>
        <Button label="Save details" onPress={save} busy={update.isPending} busyLabel="Saving…" />
        <Button variant="quiet" label="Cancel" onPress={onClose} />
      </View>
    </Dialog>
  );
}

const styles = StyleSheet.create({
  photos: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  strip: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  photo: { width: 96, height: 72, borderRadius: radius.sm, backgroundColor: colors.sunken },
  uploaded: { alignItems: 'center', justifyContent: 'center' },
  item: { gap: 2 },
  remove: { ...type.label, color: colors.danger },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  small: { ...type.small, color: colors.inkMuted },
});
