/** Pattern documents: true-scale PDF and SVG, with paper sizes and foam materials for the UI. */
export { renderPatternPdf, planPatternPdf } from "./render-pattern-pdf";
export { renderPatternSvg } from "./render-pattern-svg";
export { PAPER_IDS, PAPER_SIZES, PT_PER_MM, type PaperId, type PaperSize } from "./paper-sizes";
export { FOAM_MATERIALS, findFoamMaterial, type FoamMaterial } from "./materials";
export { DEFAULT_OVERLAP_MM, MAX_OVERLAP_MM, type PatternInput, type PatternMeta, type PatternAssembly, type PatternPdfOptions } from "./pattern-input";
