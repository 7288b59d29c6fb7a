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
 * Returns the number, or NaN when no number starts there. A result of ±Infinity means the literal overflowed
 * (e.g. `1e999`); callers reject it.
 *
 * Accuracy: up to 15 significant digits with a decimal exponent within ±22 the result is exact-rounded (Clinger's
 * fast path: both operands exact, one rounding; Source: W. D. Clinger, "How to Read Floating Point Numbers
 * Accurately", PLDI 1990). 16–19 digits (what shortest round-trip printing of doubles produces) go through
 * double-double arithmetic (Source: T. J. Dekker, "A floating-point technique for extending the available
 * precision", Numer. Math. 18, 1971), which rounds correctly except within ~1e-15 ulp of a halfway case. Anything
 * longer falls back to `Number()` on that slice.
 */
export function scanFloat(bytes: Uint8Array, start: number, end: number): number {
  let i = start;
  let negative = false;
  let c = i < end ? bytes[i] : 0;
  if (c === 43 /* + */ || c === 45 /* - */) {
    negative = c === 45;
    i++;
  }
  let hi = 0; // first 15 significant digits
  let lo = 0; // next up to 4 significant digits
  let loDigits = 0;
  let digits = 0; // significant digits seen
  let sawDigit = false;
  let exp10 = 0;
  while (i < end) {
    c = bytes[i];
    if (c < 48 || c > 57) break;
    sawDigit = true;
    if (digits > 0 || c !== 48) {
      if (digits < 15) hi = hi * 10 + (c - 48);
      else if (digits < 19) { lo = lo * 10 + (c - 48); loDigits++; }
      else exp10++;
      digits++;
    }
    i++;
  }
  if (i < end && bytes[i] === 46 /* . */) {
    i++;
    while (i < end) {
      c = bytes[i];
      if (c < 48 || c > 57) break;
      sawDigit = true;
      if (digits > 0 || c !== 48) {
        if (digits < 15) { hi = hi * 10 + (c - 48); exp10--; }
        else if (digits < 19) { lo = lo * 10 + (c - 48); loDigits++; exp10--; }
        digits++;
      } else {
        exp10--;
      }
      i++;
    }
  }
  if (!sawDigit) {
    scanState.end = start;
    return NaN;
  }
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
  if (digits === 0) return negative ? -0 : 0;
  if (digits > 19 || exp10 > 22 || exp10 < -22) return slowParse(bytes, start, i);
  let v: number;
  if (digits <= 15) {
    v = exp10 >= 0 ? hi * POW10[exp10] : hi / POW10[-exp10];
  } else {
    // N = hi·10^loDigits + lo as a double-double (a, b), then scaled by 10^exp10.
    const scale = POW10[loDigits];
    let a = hi * scale;
    let b = twoProductError(hi, scale, a);
    const s = a + lo;
    const bb = s - a;
    b += (a - (s - bb)) + (lo - bb);
    a = s;
    if (exp10 >= 0) {
      const p = POW10[exp10];
      const q = a * p;
      v = q + (twoProductError(a, p, q) + b * p);
    } else {
      const p = POW10[-exp10];
      const q1 = a / p;
      const prod = q1 * p;
      const r = a - prod - twoProductError(q1, p, prod) + b;
      v = q1 + r / p;
    }
  }
  return negative ? -v : v;
}

/** Exact error x·y − p of the rounded product p = fl(x·y), by Dekker's splitting (no fused multiply-add in JS). */
function twoProductError(x: number, y: number, p: number): number {
  let t = 134217729 * x; // 2^27 + 1
  const xh = t - (t - x), xl = x - xh;
  t = 134217729 * y;
  const yh = t - (t - y), yl = y - yh;
  return ((xh * yh - p) + xh * yl + xl * yh) + xl * yl;
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
