/** The report's Noto font files read from node_modules, for building PDFs in Node tests. */
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import type { FontFile, FontSource } from '../../src/deliverables/pdfFonts.ts';

const require = createRequire(import.meta.url);
const FILES: Record<FontFile, string> = {
  'latin-regular': '@expo-google-fonts/noto-sans/400Regular/NotoSans_400Regular.ttf',
  'latin-bold': '@expo-google-fonts/noto-sans/700Bold/NotoSans_700Bold.ttf',
  'cjk-regular': '@expo-google-fonts/noto-sans-jp/400Regular/NotoSansJP_400Regular.ttf',
};

export const nodeFontSource: FontSource = async (file) => {
  const bytes = await readFile(require.resolve(FILES[file]));
  return bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer;
};
