import { mkdtempSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { expect, it } from "vitest";
import { localUploadToken, parseUploadToken } from "./token";

it("the local stand-in's api key is random per checkout and kept private in the data folder", () => {
  const a = mkdtempSync(path.join(tmpdir(), "miterwise-token-"));
  const b = mkdtempSync(path.join(tmpdir(), "miterwise-token-"));
  const key = parseUploadToken(localUploadToken(a)).apiKey;
  expect(key).toMatch(/^sk_local_[0-9a-f]{64}$/);
  expect(key).not.toBe("sk_local_miterwise_stand_in_not_a_secret");
  expect(parseUploadToken(localUploadToken(a)).apiKey).toBe(key);
  expect(parseUploadToken(localUploadToken(b)).apiKey).not.toBe(key);
  expect(statSync(path.join(a, "upload-stand-in-key")).mode & 0o077).toBe(0);
});
