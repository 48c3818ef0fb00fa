// A one-time greeting for the piano page after a submit; kept in memory so the address stays clean.
let flash: { pianoId: number; message: string } | null = null;

export function setPianoFlash(pianoId: number, message: string): void {
  flash = { pianoId, message };
}

/** The message left for this piano, once. */
export function takePianoFlash(pianoId: number | null): string | null {
  if (!flash || flash.pianoId !== pianoId) return null;
  const { message } = flash;
  flash = null;
  return message;
}
