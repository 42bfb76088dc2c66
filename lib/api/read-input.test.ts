import { describe, expect, it } from "vitest";
import { z } from "zod";
import { AppError } from "@/lib/errors";
import { priceBookItemCreateSchema, priceBookUpdateSchema } from "@/lib/validators/price-books";
import { tagUpdateSchema, unitTypeSchema } from "@/lib/validators/plans";
import { isJsonMediaType, parseStrict, readJson } from "./read-input";

const post = (contentType: string | null, body: string) =>
  new Request("http://app.test/x", { method: "POST", headers: contentType ? { "content-type": contentType } : {}, body });

async function refusal(work: Promise<unknown>): Promise<AppError> {
  try {
    await work;
  } catch (error) {
    if (error instanceof AppError) return error;
    throw error;
  }
  throw new Error("expected a refusal");
}

describe("isJsonMediaType", () => {
  it("takes application/json, with or without charset=utf-8, in any case", () => {
    for (const ok of ["application/json", "Application/JSON", "application/json; charset=utf-8", 'application/json;charset="UTF-8"']) {
      expect(isJsonMediaType(ok), ok).toBe(true);
    }
  });

  it("refuses simple types that merely mention JSON, and other parameters", () => {
    for (const no of [
      null,
      "",
      "text/plain; x=application/json",
      "text/plain;application/json",
      "application/x-www-form-urlencoded; application/json",
      "multipart/form-data; boundary=application/json",
      "application/jsonp",
      "application/json-patch+json",
      "application/json; charset=latin1",
      "application/json; x=1",
    ]) {
      expect(isJsonMediaType(no), String(no)).toBe(false);
    }
  });
});

describe("readJson", () => {
  const schema = z.object({ name: z.string() });

  it("answers 415 for a body whose media type only contains application/json", async () => {
    const error = await refusal(readJson(post("text/plain; x=application/json", '{"name":"a"}'), schema));
    expect(error.status).toBe(415);
  });

  it("reads a JSON body", async () => {
    expect(await readJson(post("application/json; charset=utf-8", '{"name":"a"}'), schema)).toEqual({ name: "a" });
  });
});

describe("parseStrict", () => {
  it("names unknown fields instead of dropping them (422)", () => {
    let error: AppError | undefined;
    try {
      parseStrict(unitTypeSchema, { name: "Type A", count: 3, orgId: "x", createdBy: "y" });
    } catch (e) {
      error = e as AppError;
    }
    expect(error?.status).toBe(422);
    expect(Object.keys(error?.fields ?? {})).toEqual(["orgId", "createdBy"]);
    expect(error?.message).toMatch(/orgId/);
  });

  it("finds them in nested objects, arrays and optional parts too", () => {
    const item = { name: "Casing", kind: "casing", faceWidth: "2 1/2", thickness: "11/16", stock: [{ length: "8'", price: "9.10", role: "admin" }] };
    expect(() => parseStrict(priceBookItemCreateSchema, item)).toThrow(AppError);
    try {
      parseStrict(priceBookItemCreateSchema, item);
    } catch (e) {
      expect((e as AppError).fields).toHaveProperty(["stock.0.role"]);
    }
    try {
      parseStrict(priceBookUpdateSchema, { version: 1, labour: { minutesPerExtensionFoot: 2, hourlyRate: 50, minutesPerOpening: { "stool-and-apron": 1, "picture-frame": 1 }, orgId: "z" } });
      throw new Error("accepted");
    } catch (e) {
      expect((e as AppError).fields).toHaveProperty(["labour.orgId"]);
    }
  });

  it("reports an unknown field even when it is all that was sent", () => {
    try {
      parseStrict(tagUpdateSchema, { version: 1, orgId: "x" });
      throw new Error("accepted");
    } catch (e) {
      expect((e as AppError).fields).toHaveProperty("orgId");
    }
  });

  it("passes a body with only known fields", () => {
    expect(parseStrict(unitTypeSchema, { name: "Type A", count: "3" })).toEqual({ name: "Type A", count: 3 });
  });
});
