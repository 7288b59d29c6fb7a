/**
 * Locates the first JSON syntax error in a text, because `JSON.parse` on Node 20 does not say where it failed.
 * A small recursive-descent checker over RFC 8259's grammar (Source: RFC 8259, "The JavaScript Object Notation
 * (JSON) Data Interchange Format", §2–§7); it only runs after JSON.parse has already failed.
 */

export interface JsonSyntaxProblem {
  /** 0-based character offset */
  offset: number;
  /** 1-based line and column */
  line: number;
  column: number;
  /** what was expected and what was found, e.g. `expected "," or "]" but found "}"` */
  detail: string;
}

/** The first syntax problem, or null when the text is valid JSON. Nesting deeper than 1000 levels counts as a problem
 * (no seam file needs more than three). */
export function findJsonSyntaxError(text: string): JsonSyntaxProblem | null {
  let i = 0;
  const n = text.length;
  class Stop extends Error {
    constructor(readonly at: number, readonly detail: string) {
      super(detail);
    }
  }
  const found = (): string => (i >= n ? "the end of the text" : JSON.stringify(text[i]));
  const fail = (expected: string): never => {
    throw new Stop(i, `expected ${expected} but found ${found()}`);
  };
  const ws = (): void => {
    while (i < n && (text[i] === " " || text[i] === "\t" || text[i] === "\n" || text[i] === "\r")) i++;
  };
  const literal = (word: string): void => {
    for (let k = 0; k < word.length; k++, i++) if (text[i] !== word[k]) fail(JSON.stringify(word[k]) + ` (in "${word}")`);
  };
  const string = (): void => {
    i++; // opening quote
    for (;;) {
      if (i >= n) fail('a closing "');
      const c = text.charCodeAt(i);
      if (c === 34) { i++; return; }
      if (c < 32) fail("a character or escape (control characters must be escaped)");
      if (c === 92) {
        i++;
        const e = text[i];
        if (e === "u") {
          i++;
          for (let k = 0; k < 4; k++, i++) if (!/[0-9a-fA-F]/.test(text[i] ?? "")) fail("a hexadecimal digit in \\u escape");
          continue;
        }
        if (e === undefined || !'"\\/bfnrt'.includes(e)) fail("a valid escape after \\");
      }
      i++;
    }
  };
  const digits = (what: string): void => {
    if (!(text[i] >= "0" && text[i] <= "9")) fail(what);
    while (text[i] >= "0" && text[i] <= "9") i++;
  };
  const number = (): void => {
    if (text[i] === "-") i++;
    if (text[i] === "0") i++;
    else digits("a digit");
    if (text[i] === ".") { i++; digits("a digit after the decimal point"); }
    if (text[i] === "e" || text[i] === "E") {
      i++;
      if (text[i] === "+" || text[i] === "-") i++;
      digits("a digit in the exponent");
    }
  };
  const value = (depth: number): void => {
    if (depth > 1000) fail("less deeply nested data (more than 1000 levels)");
    ws();
    const c = text[i];
    if (c === "{") {
      i++;
      ws();
      if (text[i] === "}") { i++; return; }
      for (;;) {
        ws();
        if (text[i] !== '"') fail("a property name in double quotes");
        string();
        ws();
        if (text[i] !== ":") fail('":"');
        i++;
        value(depth + 1);
        ws();
        if (text[i] === ",") { i++; continue; }
        if (text[i] === "}") { i++; return; }
        fail('"," or "}"');
      }
    } else if (c === "[") {
      i++;
      ws();
      if (text[i] === "]") { i++; return; }
      for (;;) {
        value(depth + 1);
        ws();
        if (text[i] === ",") { i++; continue; }
        if (text[i] === "]") { i++; return; }
        fail('"," or "]"');
      }
    } else if (c === '"') string();
    else if (c === "t") literal("true");
    else if (c === "f") literal("false");
    else if (c === "n") literal("null");
    else if (c === "-" || (c >= "0" && c <= "9")) number();
    else fail("a value");
  };
  try {
    value(0);
    ws();
    if (i < n) fail("the end of the text");
    return null;
  } catch (e) {
    if (!(e instanceof Stop)) throw e;
    let line = 1, column = 1;
    for (let k = 0; k < e.at && k < n; k++) {
      if (text[k] === "\n") { line++; column = 1; } else column++;
    }
    return { offset: e.at, line, column, detail: e.detail };
  }
}
