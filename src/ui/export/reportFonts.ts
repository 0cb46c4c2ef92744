/**
 * The report's font files as the browser fetches them: Noto Sans regular and bold and Noto Sans
 * JP regular (SIL Open Font License 1.1), emitted by the build as separate files and fetched only
 * when a report is made (Noto Sans JP only when some text needs it).
 */

import latinRegular from '@expo-google-fonts/noto-sans/400Regular/NotoSans_400Regular.ttf?url';
import latinBold from '@expo-google-fonts/noto-sans/700Bold/NotoSans_700Bold.ttf?url';
import cjkRegular from '@expo-google-fonts/noto-sans-jp/400Regular/NotoSansJP_400Regular.ttf?url';
import type { FontFile, FontSource } from '../../deliverables/pdfFonts.ts';

const URLS: Record<FontFile, string> = {
  'latin-regular': latinRegular,
  'latin-bold': latinBold,
  'cjk-regular': cjkRegular,
};

export const browserFontSource: FontSource = async (file) => {
  const response = await fetch(URLS[file]);
  if (!response.ok)
    throw new Error(`the report font ${file} could not be loaded (${response.status})`);
  return response.arrayBuffer();
};
