export const FONT_FILES: string[];
export const SUBSET_RANGES: [number, number][];
export function subsetFontPath(root: string, file: string): string;
