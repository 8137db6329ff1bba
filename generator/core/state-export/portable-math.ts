// Runs a computation with Math.sin, Math.cos and Math.pow replaced by @stdlib's (fdlibm in plain
// JavaScript, so the same bits in every engine), then puts the natives back. V8 builds differ in the last
// bits of these functions (Node 20 and a current Chromium disagree on a few per cent of arguments), and
// the integrator's step control, the frame maps and astronomy-engine call them: under this wrapper a
// state export gives the same bytes from the CLI and from the orbit page. Synchronous only, so nothing
// else runs while the globals are swapped; everything outside an export keeps the native functions.
import cos from '@stdlib/math-base-special-cos';
import pow from '@stdlib/math-base-special-pow';
import sin from '@stdlib/math-base-special-sin';

export function withPortableMath<T>(compute: () => T): T {
  const native = { sin: Math.sin, cos: Math.cos, pow: Math.pow };
  Math.sin = sin;
  Math.cos = cos;
  Math.pow = pow;
  try {
    return compute();
  } finally {
    Math.sin = native.sin;
    Math.cos = native.cos;
    Math.pow = native.pow;
  }
}
