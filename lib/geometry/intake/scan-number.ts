/**
 * Byte-level number scanning for the text mesh formats (OBJ, ASCII STL). Works on the raw file bytes so a
 * million-face file is never split into per-token strings.
 *
 * Each scanner returns the value and leaves the end position in `scanState.end`; on failure it returns NaN and leaves
 * `scanState.end` at the start, so the caller can quote the offending word in its error message.
 */

/** Where the last scan stopped (exclusive byte index). One shared slot: the scanners allocate nothing. */
export const scanState = { end: 0 };

/** Exact powers of ten as doubles: 10^0 … 10^22 are exactly representable. Source: IEEE 754 binary64 (53-bit significand). */
const POW10 = new Float64Array(23);
for (let k = 0, p = 1; k < 23; k++, p *= 10) POW10[k] = p;

/**
 * Scans a decimal floating-point number (`[+-]digits[.digits][(e|E)[+-]digits]`, also `.5` and `5.`) at `start`.
 * Returns the number, or NaN when no number starts there. The fast path is exact when the significand has at most
 * 15 digits and the decimal exponent is within ±22 (Clinger's fast path: both operands exact, one rounding;
 * Source: W. D. Clinger, "How to Read Floating Point Numbers Accurately", PLDI 1990); other inputs fall back to
 * `Number()` on that slice, so every result equals what JavaScript itself would parse.
 * A result of ±Infinity means the literal overflowed (e.g. `1e999`); callers reject it.
 */
export function scanFloat(bytes: Uint8Array, start: number, end: number): number {
  let i = start;
  let negative = false;
  let c = i < end ? bytes[i] : 0;
  if (c === 43 /* + */ || c === 45 /* - */) {
    negative = c === 45;
    i++;
  }
  let mantissa = 0;
  let digits = 0; // significant digits accumulated into mantissa
  let dropped = 0; // integer digits beyond the fast-path precision
  let sawDigit = false;
  let exp10 = 0;
  while (i < end) {
    c = bytes[i];
    if (c < 48 || c > 57) break;
    sawDigit = true;
    if (digits < 15) {
      if (mantissa !== 0 || c !== 48) {
        mantissa = mantissa * 10 + (c - 48);
        digits++;
      }
    } else {
      dropped++;
    }
    i++;
  }
  if (i < end && bytes[i] === 46 /* . */) {
    i++;
    while (i < end) {
      c = bytes[i];
      if (c < 48 || c > 57) break;
      sawDigit = true;
      if (digits < 15) {
        if (mantissa !== 0 || c !== 48) {
          mantissa = mantissa * 10 + (c - 48);
          digits++;
        }
        exp10--;
      } else {
        dropped++;
      }
      i++;
    }
  }
  if (!sawDigit) {
    scanState.end = start;
    return NaN;
  }
  let slow = dropped > 0;
  if (i < end && (bytes[i] === 101 || bytes[i] === 69) /* e E */) {
    let j = i + 1;
    let expNegative = false;
    if (j < end && (bytes[j] === 43 || bytes[j] === 45)) {
      expNegative = bytes[j] === 45;
      j++;
    }
    let e = 0;
    let expDigits = 0;
    while (j < end) {
      c = bytes[j];
      if (c < 48 || c > 57) break;
      if (e < 100000) e = e * 10 + (c - 48);
      expDigits++;
      j++;
    }
    if (expDigits > 0) {
      exp10 += expNegative ? -e : e;
      i = j;
    }
  }
  scanState.end = i;
  if (!slow && mantissa === 0) return negative ? -0 : 0;
  if (slow || exp10 > 22 || exp10 < -22) return slowParse(bytes, start, i);
  const v = exp10 >= 0 ? mantissa * POW10[exp10] : mantissa / POW10[-exp10];
  return negative ? -v : v;
}

function slowParse(bytes: Uint8Array, start: number, end: number): number {
  let s = "";
  for (let k = start; k < end; k++) s += String.fromCharCode(bytes[k]);
  return Number(s);
}

/**
 * Scans a decimal integer `[+-]digits` at `start`. Returns NaN when no digits start there; values beyond ±2^53 are
 * returned as Infinity so index checks fail loudly instead of wrapping.
 */
export function scanInt(bytes: Uint8Array, start: number, end: number): number {
  let i = start;
  let negative = false;
  if (i < end && (bytes[i] === 43 || bytes[i] === 45)) {
    negative = bytes[i] === 45;
    i++;
  }
  const first = i;
  let v = 0;
  while (i < end) {
    const c = bytes[i];
    if (c < 48 || c > 57) break;
    v = v * 10 + (c - 48);
    i++;
  }
  if (i === first) {
    scanState.end = start;
    return NaN;
  }
  scanState.end = i;
  if (v > Number.MAX_SAFE_INTEGER) v = Infinity;
  return negative ? -v : v;
}

/** The word (up to whitespace, max 40 characters) at `start`, for quoting in error messages. */
export function wordAt(bytes: Uint8Array, start: number, end: number): string {
  let s = "";
  for (let k = start; k < end && k < start + 40; k++) {
    const c = bytes[k];
    if (c === 32 || c === 9 || c === 10 || c === 13) break;
    s += c >= 32 && c < 127 ? String.fromCharCode(c) : `\\x${c.toString(16).padStart(2, "0")}`;
  }
  return s;
}
