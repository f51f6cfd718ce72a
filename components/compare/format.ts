/**
 * Numbers as the build tools show them: fixed decimals with a true minus sign,
 * a plus on differences, a dash for "none".
 * Example: formatFixed(-0.25, 1) → '−0.3'; formatSigned(3.54, 1) → '+3.5'; formatFixed(null, 1) → '—'
 */
export function formatFixed(value: number | null | undefined, digits: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  const text = value.toFixed(digits);
  // Numeric care: −0.04 to one decimal must not read "−0.0".
  return Number(text) === 0 ? (0).toFixed(digits) : text.replace(/^-/, '−');
}

/** A difference: "+3.5", "−0.4", "0.0"; '—' for none. Example: formatSigned(0.04, 1) → '0.0' */
export function formatSigned(value: number | null | undefined, digits: number): string {
  const text = formatFixed(value, digits);
  if (text === '—' || Number(text.replace('−', '-')) === 0) return text;
  return value! > 0 ? `+${text}` : text;
}
