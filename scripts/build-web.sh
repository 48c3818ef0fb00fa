#!/usr/bin/env bash
# Exports the Expo web app to dist/ (single-page app served by the Express server).
set -euo pipefail
ROOT=$(cd "$(dirname "$0")/.." && pwd)
cd "$ROOT"
mkdir -p .tmp
CI=1 EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 TMPDIR="$ROOT/.tmp" npx expo export --platform web --output-dir dist >.tmp/expo-export.log 2>&1 || { cat .tmp/expo-export.log; exit 1; }
tail -n 3 .tmp/expo-export.log
