import { create } from 'qrcode';
import { useMemo } from 'react';
import { Image, StyleSheet, View } from 'react-native';

import { PALETTE, RADIUS } from '@/modules/theme/core/palette';

/** An SVG of the code's dark modules, one path, with the four-module quiet zone the QR standard asks for. */
function qrSvg(text: string): string {
  const { modules } = create(text, { errorCorrectionLevel: 'M' });
  const n = modules.size;
  const quiet = 4;
  let path = '';
  for (let row = 0; row < n; row += 1) {
    for (let col = 0; col < n; col += 1) {
      if (modules.get(row, col)) path += `M${col + quiet} ${row + quiet}h1v1h-1z`;
    }
  }
  const side = n + quiet * 2;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${side} ${side}" shape-rendering="crispEdges"><rect width="${side}" height="${side}" fill="#ffffff"/><path d="${path}" fill="${PALETTE.ebony}"/></svg>`;
}

/** A QR code for a link, drawn as an image so a phone's camera can open the page. */
export function QrCode({ value, size = 180, label, testID }: { value: string; size?: number; label: string; testID?: string }) {
  // base64: react-native-web re-encodes a ";utf8," SVG address itself, which would spoil an encoded one
  const uri = useMemo(() => `data:image/svg+xml;base64,${btoa(qrSvg(value))}`, [value]);
  return (
    <View style={[styles.frame, { width: size + 2, height: size + 2 }]} testID={testID}>
      <Image source={{ uri }} style={{ width: size, height: size }} accessibilityLabel={label} role="img" />
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { borderWidth: 1, borderColor: PALETTE.linen, borderRadius: RADIUS.sm, overflow: 'hidden', backgroundColor: '#ffffff' },
});
