// A sentence that names knots of the table in the shared ASCII form ("invariants match 4_1"),
// with each name typeset (4₁) as the Readout's name line shows it. The label writes the names as
// the typeset ones' own labels do (4₁), so a screen reader never hears "4 underscore 1".
import { Text, type StyleProp, type TextStyle } from 'react-native';
import { nameTeX, nameUnicode } from '@/lib/slate/readout';
import { TeX } from '@/components/ui/Math';

const NAME = /(\b\d+_\d+\b)/;
const NAMES = new RegExp(NAME.source, 'g');

export function NameText({ text, style, testID }: { text: string; style?: StyleProp<TextStyle>; testID?: string }) {
  return (
    <Text style={style} testID={testID} aria-label={text.replace(NAMES, nameUnicode)}>
      {text.split(NAME).map((piece, i) => (i % 2 === 1 ? <TeX key={i} tex={nameTeX(piece)} text={nameUnicode(piece)} /> : piece))}
    </Text>
  );
}
