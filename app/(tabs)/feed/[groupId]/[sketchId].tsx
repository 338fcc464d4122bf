import { useLocalSearchParams } from 'expo-router';
import { GroupSketchPage } from '@/components/feed/GroupSketchPage';

export default function GroupSketchScreen() {
  const { groupId, sketchId } = useLocalSearchParams<{ groupId: string; sketchId: string }>();
  return <GroupSketchPage groupId={groupId} sketchId={sketchId} />;
}
