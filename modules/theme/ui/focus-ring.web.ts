import { PALETTE } from '@/modules/theme/core/palette';

const STYLE_ID = 'feltwire-focus-ring';

// A dark brass ring with a paper-coloured halo: visible on the ivory page and on the felt nav alike.
export function installFocusRing(): void {
  if (typeof document === 'undefined' || document.getElementById(STYLE_ID)) return;
  const style = document.createElement('style');
  style.id = STYLE_ID;
  style.textContent = [
    `:focus-visible { outline: 3px solid ${PALETTE.brassShade} !important; outline-offset: 2px !important; box-shadow: 0 0 0 2px ${PALETTE.vellum} !important; }`,
    `[data-focus="inset"]:focus-visible { outline-offset: -4px !important; box-shadow: inset 0 0 0 6px ${PALETTE.vellum} !important; }`,
    `html, body { background-color: ${PALETTE.ivory}; }`,
  ].join('\n');
  document.head.appendChild(style);
}
