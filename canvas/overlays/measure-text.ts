/** Text widths for the plan's labels, measured once per string with the canvas's own font metrics. */
let ctx: CanvasRenderingContext2D | null | undefined;
const cache = new Map<string, number>();

export function textWidth(text: string, fontSize: number, fontStyle = '600', fontFamily = 'Inter Tight'): number {
  const key = `${fontStyle}|${fontSize}|${fontFamily}|${text}`;
  const hit = cache.get(key);
  if (hit !== undefined) return hit;
  if (ctx === undefined) ctx = typeof document === 'undefined' ? null : document.createElement('canvas').getContext('2d');
  let w: number;
  if (ctx) {
    ctx.font = `${fontStyle} ${fontSize}px "${fontFamily}", sans-serif`;
    w = ctx.measureText(text).width;
  } else {
    // No canvas (server, tests): a generous average glyph width for this face.
    w = text.length * fontSize * 0.58;
  }
  if (cache.size > 2000) cache.clear();
  // Until the web font is in, widths are the fallback face's: measure again once it has loaded.
  if (typeof document === 'undefined' || !document.fonts || document.fonts.status === 'loaded') cache.set(key, w);
  return w;
}

/** Forget measured widths (the web font has just loaded). */
export function clearTextWidths(): void {
  cache.clear();
}
