// A sketch's board photos: thumbnails (tap for the full image), add one from the camera roll
// or a file, remove my own (owners and admins: any). The server checks and re-encodes them.
import { useState } from 'react';
import { Image, Pressable, StyleSheet, Text, View } from 'react-native';
import * as ImagePicker from 'expo-image-picker';
import { router } from 'expo-router';
import type { Photo } from '@/shared/api/photos';
import { Sha256 } from '@/shared/api/sketches';
import { useDeletePhoto, useUploadPhoto } from '@/hooks/queries/useFeed';
import { useSession } from '@/hooks/useSession';
import { apiUrl } from '@/lib/api';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, radius, space, type } from '@/constants/theme';

export function PhotoStrip({ groupId, sketchId, photos, canUpload, canModerate }: {
  groupId: string;
  sketchId: string;
  photos: Photo[];
  canUpload: boolean;
  canModerate: boolean;
}) {
  const me = useSession((s) => s.user);
  const upload = useUploadPhoto(groupId, sketchId);
  const remove = useDeletePhoto(groupId);
  const [big, setBig] = useState<Photo | null>(null);

  async function pick() {
    const r = await ImagePicker.launchImageLibraryAsync({ mediaTypes: ['images'], quality: 1, exif: false });
    const a = r.canceled ? null : r.assets[0];
    if (a) upload.mutate({ uri: a.uri, name: a.fileName ?? 'board-photo.jpg', type: a.mimeType ?? 'image/jpeg', file: a.file });
  }

  return (
    <View style={styles.wrap}>
      {photos.length === 0 ? <Text style={styles.muted}>No board photos yet.</Text> : null}
      <View style={styles.grid}>
        {photos.map((p) => (
          <View key={p.id} style={styles.item}>
            <Pressable onPress={() => setBig(big?.id === p.id ? null : p)} aria-label={`Board photo by ${p.uploader.displayName}`}>
              <Image source={{ uri: apiUrl(p.thumbUrl) }} style={styles.thumb} />
            </Pressable>
            {Sha256.safeParse(p.id).success ? (
              // A photo the owner attached on the Slate (S25, S27): the server only lets it go by
              // editing the sketch, so it is removed from the sketch's details.
              p.uploader.id === me?.id ? (
                <Text role="link" style={styles.hint} onPress={() => router.push(`/sketches/${sketchId}`)}>Remove in the sketch's details</Text>
              ) : null
            ) : p.uploader.id === me?.id || canModerate ? (
              <Text role="button" style={styles.remove} onPress={() => remove.mutate(p.id)}>Remove</Text>
            ) : null}
          </View>
        ))}
      </View>
      {big ? (
        <View style={[styles.big, { aspectRatio: big.width / big.height }]}>
          <Image source={{ uri: apiUrl(big.url) }} style={StyleSheet.absoluteFill} accessibilityLabel="Board photo, full size" />
        </View>
      ) : null}
      {upload.error ? <Banner tone="error" title="Photo not added">{upload.error.message}</Banner> : null}
      {remove.error ? <Banner tone="error">{remove.error.message}</Banner> : null}
      {canUpload ? (
        <>
          <View style={styles.row}>
            <Button variant="secondary" label="Add a board photo" busy={upload.isPending} busyLabel="Uploading…" onPress={pick} />
          </View>
          <Text style={styles.note}>JPEG, PNG or WebP up to 10 MB. Location and camera data are removed.</Text>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  item: { gap: 4, alignItems: 'flex-start' },
  thumb: { width: 104, height: 104, borderRadius: radius.md, backgroundColor: colors.sunken },
  big: { width: '100%', borderRadius: radius.md, overflow: 'hidden', backgroundColor: colors.sunken },
  remove: { ...type.label, color: colors.danger, minHeight: 44, minWidth: 44, paddingVertical: 13 },
  hint: { ...type.small, color: colors.accent, maxWidth: 104 },
  row: { flexDirection: 'row' },
  muted: { ...type.small, color: colors.inkMuted },
  note: { ...type.small, color: colors.inkFaint },
});
