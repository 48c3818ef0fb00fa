// Native platforms draw their own focus; the web sibling adds a keyboard focus ring.
export function installFocusRing(): void {}
