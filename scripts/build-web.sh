#!/usr/bin/env bash
# Exports the Expo web app to dist/ (single-page app served by the Express server): the fonts subset
# to WOFF2 first, then the staff app, then the buyer's pages as a bundle of their own (dist/buyer.html).
set -euo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
cd "$ROOT"
mkdir -p .tmp
export CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 TMPDIR="$ROOT/.tmp"
node_modules/.bin/tsx scripts/build-fonts.ts >.tmp/build-fonts.log 2>&1 || { cat .tmp/build-fonts.log; exit 1; }
npx expo export --platform web --output-dir dist >.tmp/expo-export.log 2>&1 || { cat .tmp/expo-export.log; exit 1; }
tail -n 3 .tmp/expo-export.log
rm -rf .tmp/buyer-bundle
FELTWIRE_BUYER_BUNDLE=1 npx expo export:embed --platform web --entry-file modules/disclosure/ui/buyer-entry.tsx --dev false --minify true \
  --bundle-output .tmp/buyer-bundle/buyer.js --assets-dest .tmp/buyer-bundle/assets >.tmp/expo-export-buyer.log 2>&1 || { cat .tmp/expo-export-buyer.log; exit 1; }
node_modules/.bin/tsx scripts/finish-web.ts .tmp/buyer-bundle/buyer.js .tmp/buyer-bundle/assets
