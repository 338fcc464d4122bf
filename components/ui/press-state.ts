import type { PressableStateCallbackType } from 'react-native';

/** react-native-web adds `hovered` to Pressable's style callback state (pointer devices only). */
export type PressState = PressableStateCallbackType & { hovered?: boolean };
