// The report's type: the app's own families, Inter for text and figures (tabular figures in
// tables) and Literata for headings, as static TrueType files (pdfkit embeds and subsets
// TrueType; the app's variable WOFF2 files cannot be subset by it). Open Font License.
import { createRequire } from 'node:module';

const require = createRequire(import.meta.url);
const FILES = {
  body: '@expo-google-fonts/inter/400Regular/Inter_400Regular.ttf',
  semi: '@expo-google-fonts/inter/600SemiBold/Inter_600SemiBold.ttf',
  bold: '@expo-google-fonts/inter/700Bold/Inter_700Bold.ttf',
  heading: '@expo-google-fonts/literata/600SemiBold/Literata_600SemiBold.ttf',
} as const;

export type FontName = keyof typeof FILES;

export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const [name, file] of Object.entries(FILES)) doc.registerFont(name, require.resolve(file));
}

/** Ink, rules and the accent, as the app's paper-like look has them. */
export const INK = { text: '#1f1b16', soft: '#574d42', faint: '#857a6c', rule: '#d9cfba', paper: '#f7f3ea', accent: '#8e4f24', caution: '#7a5300', cautionLight: '#f5e6bf' } as const;
