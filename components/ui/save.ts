// Native: the export goes to the clipboard (paste it into the paper or a mail).
import * as Clipboard from 'expo-clipboard';

export async function saveText(filename: string, text: string, _mime?: string): Promise<string> {
  await Clipboard.setStringAsync(text);
  return `Copied ${filename} to the clipboard`;
}
