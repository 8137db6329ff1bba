// A complex number as two pieces of text, real part and "± imaginary i", so a page can let the imaginary
// part wrap under the real one in a narrow cell instead of running into the next (8 significant digits).
import { formatSig } from '../format/format-number.ts';

export interface ComplexText {
  re: string;
  /** "+ 0.5 i" or "− 0.5 i"; empty for a real number. */
  im: string;
}

export function complexText([re, im]: readonly [number, number]): ComplexText {
  if (im === 0) return { re: formatSig(re, 8), im: '' };
  return { re: formatSig(re, 8), im: `${im < 0 ? '−' : '+'} ${formatSig(Math.abs(im), 8)} i` };
}
