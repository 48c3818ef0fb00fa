// The fonts the web app loads, and where their subset WOFF2 builds live (scripts/build-fonts.ts).
const path = require('node:path');

const FONT_FILES = [
  '@expo-google-fonts/fraunces/600SemiBold/Fraunces_600SemiBold.ttf',
  '@expo-google-fonts/source-sans-3/400Regular/SourceSans3_400Regular.ttf',
  '@expo-google-fonts/source-sans-3/600SemiBold/SourceSans3_600SemiBold.ttf',
];

// Latin letters for names from most of Europe, and the punctuation, arrows and signs the screens use.
const SUBSET_RANGES = [
  [0x20, 0x7e],
  [0xa0, 0x17f],
  [0x2010, 0x205e],
  [0x20ac, 0x20ac],
  [0x2122, 0x2122],
  [0x2190, 0x2199],
  [0x2212, 0x2212],
  [0x2264, 0x2265],
  [0x2713, 0x2713],
];

function subsetFontPath(root, file) {
  return path.join(root, 'build/web-fonts', path.basename(file).replace(/\.ttf$/, '.woff2'));
}

module.exports = { FONT_FILES, SUBSET_RANGES, subsetFontPath };
