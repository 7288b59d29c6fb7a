/**
 * The bundled JetBrains Mono TTF files (latin subset, weights 400 and 700), converted once from the
 * @fontsource/jetbrains-mono 5.3.0 WOFF2 files with `woff2_decompress` (pdfkit cannot read WOFF/WOFF2).
 * Licence: SIL Open Font License 1.1, see OFL.txt beside them.
 *
 * Paths are built from fixed parts only: a variable path in `fs.readFileSync` makes Turbopack trace the whole
 * project. The working directory is tried first (Next.js server, worker, CLI and tests all run from the repo root),
 * then the folder of this module.
 */
import fs from "node:fs";
import path from "node:path";

let regular: Buffer | null = null;
let bold: Buffer | null = null;

/** JetBrains Mono Regular (400), latin subset, TrueType bytes. */
export function jetbrainsMonoRegular(): Buffer {
  if (regular) return regular;
  regular = fs.existsSync(path.join(process.cwd(), "lib", "fonts", "jetbrains-mono-latin-400-normal.ttf"))
    ? fs.readFileSync(path.join(process.cwd(), "lib", "fonts", "jetbrains-mono-latin-400-normal.ttf"))
    : fs.readFileSync(new URL("./jetbrains-mono-latin-400-normal.ttf", import.meta.url));
  return regular;
}

/** JetBrains Mono Bold (700), latin subset, TrueType bytes. */
export function jetbrainsMonoBold(): Buffer {
  if (bold) return bold;
  bold = fs.existsSync(path.join(process.cwd(), "lib", "fonts", "jetbrains-mono-latin-700-normal.ttf"))
    ? fs.readFileSync(path.join(process.cwd(), "lib", "fonts", "jetbrains-mono-latin-700-normal.ttf"))
    : fs.readFileSync(new URL("./jetbrains-mono-latin-700-normal.ttf", import.meta.url));
  return bold;
}
