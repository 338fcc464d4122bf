// A new, empty sketch in the device store, then its Slate (replacing this route in history);
// left empty, the Slate removes it again.
import { useEffect, useRef } from 'react';
import { View } from 'react-native';
import { router } from 'expo-router';
import { useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { useDevice } from '@/hooks/useDevice';
import { FRESH_PARAM } from '@/lib/slate/fresh';
import { Banner } from '@/components/ui/Banner';
import { colors, space } from '@/constants/theme';

export default function NewSketch() {
  const device = useDevice();
  const { create } = useSketchWrites();
  const started = useRef(false);
  useEffect(() => {
    if (!device || started.current) return;
    started.current = true;
    create.mutate({}, {
      // Marked fresh: removed again if nothing is put in it (lib/slate/fresh.ts).
      onSuccess: (s) => router.replace(`/sketches/${s.id}?${FRESH_PARAM}=1`),
    });
  }, [device, create]);
  return (
    <View style={{ flex: 1, padding: space.xl, backgroundColor: colors.paper }}>
      {create.error ? <Banner tone="error" title="Could not start a sketch">{create.error.message}</Banner> : null}
    </View>
  );
}
