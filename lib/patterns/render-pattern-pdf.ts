/**
 * The true-scale pattern PDF.
 *
 * Pages, in order: cover (project, scale, foam, safety cautions, pieces with stretch), page map and legend,
 * assembly sheet (views and cut list), then the true-size tiles (or one full-size page for `paper: "full"`).
 * Every page carries the key strip: a 5 cm and a 1 in test square, the page name and the safety reminder.
 * Drawing is in PDF points (1/72 in, ISO 32000-1 §8.3.2.3) with layout millimetres × 72 / 25.4.
 */
import { buildLayout } from "./layout";
import { buildCutList } from "./cut-list";
import { summarizeStretch } from "./stretch-summary";
import { findFoamMaterial } from "./materials";
import { PAPER_SIZES } from "./paper-sizes";
import { markBlankTiles, planTiles, printedTiles } from "./tiling";
import { polygonMeetsBox, type Box } from "./polygon";
import { createdAtDate, validatePatternInput, validatePdfOptions, type PatternInput, type PatternPdfOptions } from "./pattern-input";
import { createDoc } from "./pdf/pdf-doc";
import type { RenderCtx } from "./pdf/render-context";
import { drawCoverPage } from "./pdf/cover-page";
import { drawLegendPage } from "./pdf/legend-page";
import { drawAssemblyPage } from "./pdf/assembly-page";
import { drawTilePages } from "./pdf/tile-pages";
import { drawKeyStrips } from "./pdf/key-strip";

/** Everything the PDF writer decides before drawing (exposed for tests and the UI's page-count preview). */
export function planPatternPdf(input: PatternInput, opts: PatternPdfOptions) {
  validatePatternInput(input);
  const overlapMm = validatePdfOptions(opts);
  const material = findFoamMaterial(input.meta.material);
  const materialName = material ? material.name : input.meta.material;
  const layout = buildLayout(input.report, materialName, input.meta.thicknessMm);
  const sheet = { left: layout.box.minX, top: layout.box.maxY, widthMm: layout.widthMm, heightMm: layout.heightMm };
  const meets = (box: Box) =>
    layout.pieces.some((p) => p.box.minX <= box.maxX && p.box.maxX >= box.minX && p.box.minY <= box.maxY && p.box.maxY >= box.minY && polygonMeetsBox(p.outline, box));
  // Orientation by printed pages: blank tiles are left out, so the grid size alone can mislead.
  let plan = markBlankTiles(planTiles(sheet, opts.paper, overlapMm), meets);
  if (opts.paper !== "full") {
    for (const o of ["portrait", "landscape"] as const) {
      const alt = markBlankTiles(planTiles(sheet, opts.paper, overlapMm, o), meets);
      if (printedTiles(alt).length < printedTiles(plan).length) plan = alt;
    }
  }
  return { layout, plan, materialName, overlapMm };
}

export async function renderPatternPdf(input: PatternInput, opts: PatternPdfOptions): Promise<Buffer> {
  const { layout, plan, materialName } = planPatternPdf(input, opts);
  const createdAt = createdAtDate(input.meta);
  const doc = createDoc({ compress: opts.compress ?? true, title: `${input.meta.projectName} - pattern`, createdAt });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  const letter = PAPER_SIZES.letter;
  const info = plan.paper === "full" ? letter : PAPER_SIZES[plan.paper];
  const ctx: RenderCtx = {
    doc, input, layout, plan, materialName, createdAt,
    cutList: buildCutList(layout),
    stretch: summarizeStretch(input.report.pieces, input.meta.material),
    infoPage: { widthPt: info.widthPt, heightPt: info.heightPt },
    pages: [],
  };
  drawCoverPage(ctx);
  drawLegendPage(ctx);
  drawAssemblyPage(ctx);
  drawTilePages(ctx);
  drawKeyStrips(ctx);
  doc.end();
  return done;
}
