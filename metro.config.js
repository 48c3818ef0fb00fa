// Expo's Metro defaults, with three changes for the web: zod's locales English only, the fonts as
// subset WOFF2 (scripts/build-fonts.ts), and the buyer's bundle without the router.
const fs = require('node:fs');
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const { FONT_FILES, subsetFontPath } = require('./scripts/metro/web-fonts');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts = [...config.resolver.assetExts, 'woff2'];

const ENGLISH_ONLY = path.join(__dirname, 'scripts/metro/zod-locales-en.ts');
const ZOD = `${path.sep}node_modules${path.sep}zod${path.sep}`;
const SUBSETS = new Map(FONT_FILES.map((file) => [path.basename(file), subsetFontPath(__dirname, file)]));
// The buyer's bundle (FELTWIRE_BUYER_BUNDLE=1, scripts/build-web.sh) has no router: its links are plain <a href>.
const BUYER = process.env.FELTWIRE_BUYER_BUNDLE === '1';
const PLAIN_LINK = path.join(__dirname, 'modules/theme/ui/plain-link.tsx');

config.resolver.resolveRequest = (context, moduleName, platform) => {
  if (context.originModulePath.includes(ZOD) && /(^|\/)locales\/index(\.c?js)?$/.test(moduleName)) return { type: 'sourceFile', filePath: ENGLISH_ONLY };
  if (BUYER && moduleName === 'expo-router') return { type: 'sourceFile', filePath: PLAIN_LINK };
  const subset = moduleName.endsWith('.ttf') ? SUBSETS.get(path.basename(moduleName)) : undefined;
  // Without a font build (a dev server started by hand) the shipped TTF is used as it is.
  if (subset && fs.existsSync(subset)) return { type: 'assetFiles', filePaths: [subset] };
  return context.resolveRequest(context, moduleName, platform);
};

module.exports = config;
