import { afterEach, describe, expect, it, vi } from "vitest";
import { UniqueConstraintError } from "sequelize";
import { z } from "zod";
import { route } from "@/lib/api/route-handler";
import { AppError, ERROR_STATUS, type ErrorCode } from "@/lib/errors/app-error";
import { call, errorOf } from "./support/call";

/** The wrapper's own behaviour: error mapping, the generic 500 with one log line, query validation. */
afterEach(() => {
  vi.restoreAllMocks();
});

describe("route wrapper", () => {
  it("maps every AppError code to its status and the contract's body", async () => {
    for (const code of Object.keys(ERROR_STATUS) as ErrorCode[]) {
      const h = route({ auth: "none" }, () => {
        throw new AppError(code, `Clear sentence for ${code}.`);
      });
      const res = await call(h, "GET", "/api/x");
      expect(res.status).toBe(ERROR_STATUS[code]);
      expect(await res.json()).toEqual({ error: { code, message: `Clear sentence for ${code}.` } });
    }
  });

  it("an unexpected error answers a generic 500 and logs one line, without leaking details", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const h = route({ auth: "none" }, () => {
      throw new Error("connection string postgres://secret@db");
    });
    const res = await call(h, "GET", "/api/boom");
    expect(res.status).toBe(500);
    const err = await errorOf(res);
    expect(err.code).toBe("INTERNAL");
    expect(err.message).not.toMatch(/secret|postgres/);
    expect(log).toHaveBeenCalledTimes(1);
    expect(String(log.mock.calls[0][0])).toMatch(/^\[api\] 500 GET \/api\/boom: Error: /);
    expect(String(log.mock.calls[0][0])).not.toContain("\n");
  });

  it("a unique-constraint race answers 409", async () => {
    const h = route({ auth: "none" }, () => {
      throw new UniqueConstraintError({ message: "dup" });
    });
    expect((await call(h, "GET", "/api/x")).status).toBe(409);
  });

  it("plain data is sent as JSON 200, uncached; query strings are validated (422 naming the parameter)", async () => {
    const h = route({ auth: "none", query: z.object({ page: z.coerce.number().int().min(1, { error: "Page must be 1 or more." }) }) }, ({ query }) => ({ page: query.page }));
    const ok = await call(h, "GET", "/api/x?page=2");
    expect(ok.status).toBe(200);
    expect(ok.headers.get("cache-control")).toBe("no-store");
    expect(await ok.json()).toEqual({ page: 2 });
    const bad = await call(h, "GET", "/api/x?page=0");
    expect(bad.status).toBe(422);
    expect((await errorOf(bad)).message).toBe("page: Page must be 1 or more.");
  });

  it("a custom body limit is honoured", async () => {
    const h = route({ auth: "none", body: z.object({ a: z.string() }), maxBodyBytes: 16 }, ({ body }) => body);
    expect((await call(h, "POST", "/api/x", { json: { a: "short" } })).status).toBe(200);
    expect((await call(h, "POST", "/api/x", { json: { a: "much longer than sixteen" } })).status).toBe(413);
  });
});
