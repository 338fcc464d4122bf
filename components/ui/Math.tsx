// Native: no KaTeX, so the plain-text form in the math face's place (Math.web.tsx typesets).
import { Text } from 'react-native';
import { colors, type } from '@/constants/theme';

export function TeX({ text, nowrap = false }: { tex: string; text: string; display?: boolean; nowrap?: boolean }) {
  return <Text style={[type.code, { color: colors.ink }]} numberOfLines={nowrap ? 1 : undefined}>{text}</Text>;
}
