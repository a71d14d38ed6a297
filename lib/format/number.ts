/**
 * The app's one number formatter. Fixed decimals, thousands grouped with commas and a true minus sign
 * (U+2212). It does not follow the browser's locale, so a figure renders the same on the server, in the
 * browser and in a document; it is also far cheaper than toLocaleString, and results format many figures.
 */
export function formatNumber(n: number, decimals = 0): string {
  if (!Number.isFinite(n)) return n > 0 ? '∞' : n < 0 ? '−∞' : '—';
  const fixed = Math.abs(n).toFixed(decimals);
  const dot = fixed.indexOf('.');
  const int = dot < 0 ? fixed : fixed.slice(0, dot);
  let grouped = '';
  for (let i = 0; i < int.length; i++) {
    if (i > 0 && (int.length - i) % 3 === 0) grouped += ',';
    grouped += int[i];
  }
  // A value that rounds to zero is written without a sign ("0.0", not "−0.0").
  const negative = n < 0 && Number(fixed) !== 0;
  return (negative ? '−' : '') + grouped + (dot < 0 ? '' : fixed.slice(dot));
}

/** Rounds to `digits` significant figures (for figures converted from a rounded value). */
export function roundSignificant(n: number, digits: number): number {
  if (n === 0 || !Number.isFinite(n)) return n;
  const p = Math.pow(10, digits - Math.ceil(Math.log10(Math.abs(n))));
  return Math.round(n * p) / p;
}
