/**
 * Length strings as a fabricator types them: `6mm`, `0.5in`, `12 cm`, `1.2m`, `4"`; a bare number only when the caller
 * supplies a default unit. Anything else (fractions, two numbers, unknown units) is refused with one clear sentence.
 */
import { GeometryError } from "../errors";
import { LENGTH_UNITS, MM_PER_UNIT, type LengthUnit } from "../mesh";

/** A length with its unit, as parsed. */
export interface Length {
  value: number;
  unit: LengthUnit;
}

const UNIT_ALIASES: Readonly<Record<string, LengthUnit>> = {
  mm: "mm",
  millimeter: "mm",
  millimeters: "mm",
  millimetre: "mm",
  millimetres: "mm",
  cm: "cm",
  centimeter: "cm",
  centimeters: "cm",
  centimetre: "cm",
  centimetres: "cm",
  m: "m",
  meter: "m",
  meters: "m",
  metre: "m",
  metres: "m",
  in: "in",
  inch: "in",
  inches: "in",
  '"': "in",
};

const LENGTH_RE = /^([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?)\s*([a-z"]*)$/i;

/**
 * Parses a length string.
 *
 * @param text         e.g. "6mm", "0.5in", "12 cm", "1.2m", "4\"" (case-insensitive; space between number and unit ok)
 * @param defaultUnit  unit for a bare number ("6"); without it a bare number is an error
 * @param what         name of the quantity for error messages ("thickness", "target width")
 * @throws GeometryError BAD_PARAMETER with one sentence naming the quantity, the text and what is accepted
 */
export function parseLength(text: string, defaultUnit?: LengthUnit, what = "length"): Length {
  const trimmed = text.trim();
  const m = LENGTH_RE.exec(trimmed);
  if (!m) {
    throw new GeometryError(
      "BAD_PARAMETER",
      `The ${what} "${text}" is not a length; write a number and a unit, e.g. 6mm, 0.5in, 12 cm or 1.2m.`,
    );
  }
  const value = Number(m[1]);
  if (!Number.isFinite(value)) {
    throw new GeometryError("BAD_PARAMETER", `The ${what} "${text}" is not a finite number.`);
  }
  const unitText = m[2].toLowerCase();
  let unit: LengthUnit;
  if (unitText === "") {
    if (!defaultUnit) {
      throw new GeometryError(
        "BAD_PARAMETER",
        `The ${what} "${text}" has no unit; add one of ${LENGTH_UNITS.join(", ")} (e.g. ${trimmed}mm).`,
      );
    }
    unit = defaultUnit;
  } else {
    const u = UNIT_ALIASES[unitText];
    if (!u) {
      throw new GeometryError(
        "BAD_PARAMETER",
        `The ${what} "${text}" has an unknown unit "${m[2]}"; use one of ${LENGTH_UNITS.join(", ")}.`,
      );
    }
    unit = u;
  }
  return { value, unit };
}

/** Converts a length to another unit. Source of the factors: MM_PER_UNIT (1 in = 25.4 mm exactly). */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return from === to ? value : (value * MM_PER_UNIT[from]) / MM_PER_UNIT[to];
}

/** Parses `text` and returns its value in `to` units (a bare number is read in `to` units when allowBare). */
export function parseLengthIn(text: string, to: LengthUnit, what = "length", allowBare = false): number {
  const l = parseLength(text, allowBare ? to : undefined, what);
  return convertLength(l.value, l.unit, to);
}
