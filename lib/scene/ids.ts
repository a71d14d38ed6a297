let idCounter = 0;
/** Short unique object ids: a time-based prefix keeps pasted copies from colliding across sessions. */
export function newId(kind: string): string {
  idCounter += 1;
  return `${kind}-${Date.now().toString(36).slice(-5)}${idCounter.toString(36)}`;
}
