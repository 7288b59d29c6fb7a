import { readFile } from "node:fs/promises";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { writeObj } from "@/lib/geometry/intake/write-mesh";
import { cylinderTube } from "@/lib/geometry/shapes/cylinder-tube";
import { demoEmail, e2eBaseUrl } from "./helpers/base-url";
import { E2eBrowser, type PageProblem } from "./helpers/browser";

/** Tube fixture: N segments around, B bands along; vertex (ring i, segment j) = i·N + j (lib/geometry/shapes). */
const N = 48;
const B = 120;
const tube = cylinderTube({ radius: 40, height: 160, segments: N, bands: B });
/** Two seams along the length (segments 0 and N/2) cut the tube into two half-shells. */
const seams: [number, number][] = [];
for (let i = 0; i < B; i++) {
  seams.push([i * N, (i + 1) * N]);
  seams.push([i * N + N / 2, (i + 1) * N + N / 2]);
}

/**
 * The designer's way from a mesh file to a reviewed-ready pattern in the browser: upload through the dropzone
 * (real upload progress), intake report, seams and flatten through the API, then the results screen: the pieces
 * table sorts and picks pieces, the PDF downloads, the 3D heat map is drawn, and nothing logs an error.
 */
/** Chromium asks for /favicon.ico on its own (the app serves app/icon.svg); its 404 is not this screen's doing. */
const browserFavicon = (p: PageProblem) => p.url.endsWith("/favicon.ico");

describe("studio: upload and pattern results", () => {
  let b: E2eBrowser;
  let projectId = "";
  const stamp = Date.now();

  beforeAll(async () => {
    b = await E2eBrowser.launch(await e2eBaseUrl());
  });
  afterAll(async () => {
    if (projectId && b) {
      // Tidy up as the owner (designers may not delete projects).
      await b.reset();
      await b.signIn(demoEmail("owner"));
      await b.page.request.delete(`${b.base}/api/projects/${projectId}`);
    }
    await b?.close();
  });

  it("uploads a mesh with progress, flattens it and shows the results", async () => {
    await b.signIn(demoEmail("designer"));
    const page = b.page;
    const api = page.request;

    const created = await api.post(`${b.base}/api/projects`, { data: { name: `E2E results tube ${stamp}` } });
    expect(created.status()).toBe(201);
    projectId = ((await created.json()) as { project: { id: string } }).project.id;

    // Upload through the dropzone, on a slowed-down link so the bar has time to move.
    await b.goto(`/projects/${projectId}`);
    const zone = page.getByTestId("scan-dropzone");
    await zone.waitFor({ timeout: 30_000 });
    await zone.getByLabel("Units of the file").selectOption("mm");
    await page.evaluate(() => {
      const seen: number[] = [];
      (window as unknown as { __uploadSeen: number[] }).__uploadSeen = seen;
      new MutationObserver(() => {
        const bar = document.querySelector('[data-testid="upload-progress"] [role="progressbar"]');
        if (bar) seen.push(Number(bar.getAttribute("aria-valuenow")));
      }).observe(document.body, { subtree: true, childList: true, attributes: true, attributeFilter: ["aria-valuenow"] });
    });
    const cdp = await page.context().newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 512 * 1024 });
    const obj = Buffer.from(writeObj(tube));
    await page.getByTestId("scan-file-input").setInputFiles({ name: "tube.obj", mimeType: "model/obj", buffer: obj });
    await page.getByTestId("upload-progress").waitFor({ timeout: 10_000 });
    const intake = page.locator('[data-testid="intake-status"][data-status="ready"]');
    await intake.waitFor({ timeout: 90_000 });
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    const seen = await page.evaluate(() => (window as unknown as { __uploadSeen: number[] }).__uploadSeen);
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.some((v) => v > 0 && v < 100), `progress values seen: ${seen.join(",")}`).toBe(true);
    const report = intake.getByRole("list", { name: "Intake report" });
    await report.getByText("One connected part.").waitFor();
    // An open tube has two open edge loops (top and bottom rim).
    await report.getByText(/^2 holes/).waitFor();
    await b.screenshot("results-upload");

    // Seams and flatten through the API.
    const scans = (await (await api.get(`${b.base}/api/projects/${projectId}/scans`)).json()) as { scans: { id: string; name: string }[] };
    const scanId = scans.scans.find((s) => s.name === "tube.obj")!.id;
    const saved = await api.put(`${b.base}/api/scans/${scanId}/seams`, { data: { seams } });
    expect(saved.status(), await saved.text()).toBe(200);
    const queued = await api.post(`${b.base}/api/scans/${scanId}/flatten`, { data: { material: "eva", thicknessMm: 6, paper: "letter" } });
    expect(queued.status(), await queued.text()).toBe(202);
    const { patternId } = (await queued.json()) as { patternId: string };

    // The results screen waits for the job, then shows the pieces.
    await b.goto(`/patterns/${patternId}`);
    const table = page.getByRole("table", { name: "Pieces" });
    await table.waitFor({ timeout: 180_000 });
    const labels = async () => table.locator("tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-piece-row")));
    expect(await labels()).toEqual(["A", "B"]);
    const pieceHeader = table.getByRole("columnheader", { name: /Piece/ });
    await pieceHeader.getByRole("button").click();
    await expect.poll(() => pieceHeader.getAttribute("aria-sort")).toBe("ascending");
    await pieceHeader.getByRole("button").click();
    await expect.poll(() => pieceHeader.getAttribute("aria-sort")).toBe("descending");
    expect(await labels()).toEqual(["B", "A"]);
    const stretchHeader = table.getByRole("columnheader", { name: /Max stretch/ });
    await stretchHeader.getByRole("button").click();
    await expect.poll(() => stretchHeader.getAttribute("aria-sort")).toBe("descending");

    // Picking a row highlights the piece on the flat sheet too; the keyboard does the same.
    await table.locator('tr[data-piece-row="B"]').click();
    expect(await table.locator('tr[data-piece-row="B"]').getAttribute("aria-selected")).toBe("true");
    await page.locator('[data-testid="flat-sheet"] [data-piece="B"]').waitFor();
    expect(await page.locator('[data-testid="flat-sheet"] [data-piece="B"]').getAttribute("aria-pressed")).toBe("true");
    await table.locator('tr[data-piece-row="A"]').focus();
    await page.keyboard.press("Enter");
    expect(await page.locator('[data-testid="flat-sheet"] [data-piece="A"]').getAttribute("aria-pressed")).toBe("true");

    // The 3D heat map is drawn: many distinct colours, not one flat fill.
    const canvas = page.locator('[data-testid="scan-heat-canvas"] canvas');
    await canvas.waitFor({ timeout: 60_000 });
    await expect
      .poll(
        () =>
          canvas.evaluate((c: HTMLCanvasElement) => {
            const copy = document.createElement("canvas");
            copy.width = c.width;
            copy.height = c.height;
            const ctx = copy.getContext("2d")!;
            ctx.drawImage(c, 0, 0);
            const px = ctx.getImageData(0, 0, copy.width, copy.height).data;
            const colours = new Set<number>();
            for (let i = 0; i < px.length; i += 16) colours.add(((px[i] >> 3) << 10) | ((px[i + 1] >> 3) << 5) | (px[i + 2] >> 3));
            return colours.size;
          }),
        { timeout: 30_000 },
      )
      .toBeGreaterThan(20);

    // Review status and the cautions are on the screen.
    await page.getByTestId("review-status").getByText("Waiting for review").waitFor();
    await page.getByRole("heading", { name: "Before you cut and glue" }).waitFor();
    await b.screenshot("results-pattern");

    // PDF download through the A4 button.
    const [download] = await Promise.all([page.waitForEvent("download", { timeout: 120_000 }), page.getByRole("link", { name: /A4/ }).click()]);
    const pdf = await readFile((await download.path())!);
    expect(pdf.subarray(0, 4).toString("latin1")).toBe("%PDF");

    // Tablet width: the screen reflows without sideways scrolling of the page.
    await page.setViewportSize({ width: 820, height: 1180 });
    await expect.poll(() => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await b.screenshot("results-tablet");
    await page.setViewportSize({ width: 1280, height: 800 });
    expect(b.unexpectedProblems(browserFavicon)).toEqual([]);

    // A reviewer asks for changes (a comment is required first), then approves; each decision is confirmed.
    await b.signOut();
    await b.reset();
    await b.signIn(demoEmail("reviewer"));
    await b.goto(`/patterns/${patternId}`);
    const review = page.getByRole("form", { name: "Review decision" });
    await review.getByRole("button", { name: "Request changes" }).click();
    await review.getByText("Say what should change: a comment is required when you request changes.").waitFor();
    await review.getByLabel("Comment").fill("Piece B: move the seam 10 mm towards the rim.");
    await review.getByRole("button", { name: "Request changes" }).click();
    await page.getByText("Changes requested; the designer can see your comment.").waitFor();
    await page.getByTestId("review-status").getByText("Changes requested").waitFor();
    await page.getByText("Piece B: move the seam 10 mm towards the rim.").waitFor();
    await review.getByRole("button", { name: "Approve pattern" }).click();
    await page.getByText("Pattern approved: fabricators can download it now.").waitFor();
    await page.getByTestId("review-status").getByText("Approved for cutting").waitFor();
    await b.screenshot("results-reviewed");
    expect(b.unexpectedProblems(browserFavicon)).toEqual([]);
  }, 480_000);
});
