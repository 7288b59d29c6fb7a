import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { closeRateLimitStore } from "@/lib/rate-limit/default-store";
import { DEFAULT_MAX_BODY_BYTES } from "@/lib/api/read-json-body";
import { call, errorOf } from "./support/call";
import { cleanupFixtures, createShopWithRoles, ensureSchema, type ShopFixture } from "./support/fixtures";
import { PUBLIC_ROUTES, SESSION_ROUTES } from "./support/routes";

/** Malformed JSON → 400, wrong fields → 422 naming the field, huge bodies → 413, ids that match nothing → 404. */
let f: ShopFixture;
beforeAll(async () => {
  await ensureSchema();
  f = await createShopWithRoles();
});
afterAll(async () => {
  await cleanupFixtures();
  await closeRateLimitStore();
  await closeSequelize();
});

const ALL = [...SESSION_ROUTES, ...PUBLIC_ROUTES];
const BODY_ROUTES = ALL.filter((r) => r.handler.routeOptions.hasBody);

describe("bad input", () => {
  it("every route with a body has an invalid-body case", () => {
    for (const r of BODY_ROUTES) expect(r.invalid, r.name).toBeDefined();
    for (const r of ALL.filter((x) => x.handler.routeOptions.hasParams)) expect(r.missingParams, r.name).toBeDefined();
  });

  for (const r of BODY_ROUTES) {
    describe(r.name, () => {
      it("malformed JSON → 400 BAD_JSON", async () => {
        const { params } = await r.prepare(f);
        for (const raw of ['{"name": "x",', "not json", "{'a': 1}"]) {
          const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, raw });
          expect(res.status, raw).toBe(400);
          expect((await errorOf(res)).code).toBe("BAD_JSON");
        }
      });

      it("empty body → 400 BAD_JSON", async () => {
        const { params } = await r.prepare(f);
        const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, raw: "" });
        expect(res.status).toBe(400);
      });

      it("wrong field → 422 naming the field", async () => {
        const { params } = await r.prepare(f);
        const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, json: r.invalid!.json });
        expect(res.status).toBe(422);
        const err = await errorOf(res);
        expect(err.code).toBe("VALIDATION");
        expect(err.message.startsWith(`${r.invalid!.field}: `), err.message).toBe(true);
      });

      it("missing fields, unknown fields and non-objects → 422", async () => {
        const { params } = await r.prepare(f);
        for (const json of [{}, { bogusField: 1 }, [], "text", null]) {
          const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, json });
          expect(res.status, JSON.stringify(json)).toBe(422);
          expect((await errorOf(res)).message).toMatch(/^[\w.,]+: /);
        }
      });

      it("body over the limit → 413, with and without Content-Length", async () => {
        const { params } = await r.prepare(f);
        const big = JSON.stringify({ notes: "x".repeat(DEFAULT_MAX_BODY_BYTES + 10) });
        const withLength = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, raw: big });
        expect(withLength.status).toBe(413);
        expect((await errorOf(withLength)).code).toBe("PAYLOAD_TOO_LARGE");
        // A streamed body has no Content-Length: the wrapper must count the bytes itself.
        const bytes = new TextEncoder().encode(big);
        const stream = new ReadableStream<Uint8Array>({
          start(controller) {
            for (let i = 0; i < bytes.length; i += 8192) controller.enqueue(bytes.slice(i, i + 8192));
            controller.close();
          },
        });
        const streamed = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, raw: stream });
        expect(streamed.status).toBe(413);
      });

      it("a lying Content-Length does not let a large body through", async () => {
        const { params } = await r.prepare(f);
        const big = JSON.stringify({ notes: "x".repeat(DEFAULT_MAX_BODY_BYTES + 10) });
        const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, raw: big, headers: { "content-length": "10" } });
        expect(res.status).toBe(413);
      });
    });
  }

  for (const r of ALL.filter((x) => x.missingParams)) {
    it(`${r.name}: ids that match nothing or are malformed → 404`, async () => {
      const { json } = await r.prepare(f);
      for (const params of [r.missingParams!, Object.fromEntries(Object.keys(r.missingParams!).map((k) => [k, "../etc"]))]) {
        const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, json });
        expect(res.status, JSON.stringify(params)).toBe(404);
        expect((await errorOf(res)).code).toBe("NOT_FOUND");
      }
    });
  }

  it("PATCH /api/projects/[id] with no fields → 422", async () => {
    const r = SESSION_ROUTES.find((x) => x.name === "PATCH /api/projects/[id]")!;
    const { params } = await r.prepare(f);
    const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, params, json: {} });
    expect(res.status).toBe(422);
  });

  it("cross-site POST is refused with 403", async () => {
    const r = SESSION_ROUTES.find((x) => x.name === "POST /api/projects")!;
    const { json } = await r.prepare(f);
    const res = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, json, headers: { origin: "https://evil.example" } });
    expect(res.status).toBe(403);
    const res2 = await call(r.handler, r.method, r.path, { cookie: f.cookies.owner, json, headers: { "sec-fetch-site": "cross-site" } });
    expect(res2.status).toBe(403);
  });
});
