// A workshop photo carries no work item of its own: its caption names the item for the staff's gallery.
// Pure, so the staff screens write it and the buyer's disclosure can put it in the buyer's words.
export type WorkPhase = 'before' | 'after';

const CAPTION_MAX = 200;

export function workCaption(phase: WorkPhase, itemId: number, title: string, text: string): string {
  const head = `${phase === 'before' ? 'Before' : 'After'} work (item ${itemId}, ${title})`;
  const body = text.trim();
  return (body ? `${head}: ${body}` : head).slice(0, CAPTION_MAX);
}

const CAPTION_RE = /^(Before|After) work \(item (\d+), ([^)]*)\)(?:: (.*))?$/s;

/** The parts of a workshop caption, or null for a caption of another kind. */
export function parseWorkCaption(caption: string | null): { phase: WorkPhase; itemId: number; title: string; text: string | null } | null {
  const m = caption ? CAPTION_RE.exec(caption) : null;
  if (!m) return null;
  return { phase: m[1] === 'Before' ? 'before' : 'after', itemId: Number(m[2]), title: m[3], text: m[4] ?? null };
}

/** What a buyer reads under a photo: the item number is the workshop's, not theirs. */
export function buyerCaption(caption: string | null): string | null {
  const work = parseWorkCaption(caption);
  if (!work) return caption;
  return `${work.phase === 'before' ? 'Before' : 'After'} the work (${work.title.toLowerCase()})${work.text ? `: ${work.text}` : ''}`;
}
