// Web: the export downloads as a file.
export async function saveText(filename: string, text: string, mime: string): Promise<string> {
  const url = URL.createObjectURL(new Blob([text], { type: mime }));
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  a.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
  return `Downloaded ${filename}`;
}
