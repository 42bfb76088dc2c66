import { randomBytes } from "node:crypto";
import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";

/**
 * `UPLOADTHING_TOKEN` is standard base64 of `{"apiKey":"sk_…","appId":"…","regions":[…]}`. The SDK in the
 * app signs with the api key and the upload stand-in verifies with the same key, so both sides read one token.
 */
export type UploadToken = {
  apiKey: string;
  appId: string;
  regions: string[];
  /** Only the hosted service's ingest host; the stand-in is reached through UPLOADTHING_INGEST_URL instead. */
  ingestHost?: string;
};

/** The local stand-in's app id and region; its api key is made per checkout (see `localUploadToken`). */
export const LOCAL_UPLOAD_APP = Object.freeze({ appId: "miterwiselocal", regions: ["local1"] as readonly string[] });

export function encodeUploadToken(token: UploadToken): string {
  assertValid(token);
  const body: UploadToken = { apiKey: token.apiKey, appId: token.appId, regions: [...token.regions] };
  if (token.ingestHost) body.ingestHost = token.ingestHost;
  return Buffer.from(JSON.stringify(body), "utf8").toString("base64");
}

/**
 * The local default, encoded — what `UPLOADTHING_TOKEN` is set to when nothing else is configured. The api key
 * signs the service's callbacks to the app, so a key anyone could read would let anyone forge an upload: it is
 * random, made once per checkout and kept in the data folder (like the auth secret), where the app and the
 * stand-in both read it.
 */
export function localUploadToken(dataDir = process.env.MITERWISE_DATA_DIR ?? ".data"): string {
  return encodeUploadToken({ apiKey: localApiKey(dataDir), appId: LOCAL_UPLOAD_APP.appId, regions: [...LOCAL_UPLOAD_APP.regions] });
}

function localApiKey(dataDir: string): string {
  const file = path.join(dataDir, "upload-stand-in-key");
  const read = () => readFileSync(file, "utf8").trim();
  try {
    return read();
  } catch {
    mkdirSync(dataDir, { recursive: true });
    try {
      writeFileSync(file, `sk_local_${randomBytes(32).toString("hex")}\n`, { mode: 0o600, flag: "wx" });
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== "EEXIST") throw error; // another process made it first
    }
    return read();
  }
}

/** Decodes and checks a token the way the SDK does, so a token the stand-in accepts is one the app accepts. */
export function parseUploadToken(encoded: string): UploadToken {
  let raw: unknown;
  try {
    raw = JSON.parse(Buffer.from(encoded.trim(), "base64").toString("utf8"));
  } catch {
    throw new Error("Invalid upload token: not base64-encoded JSON");
  }
  if (typeof raw !== "object" || raw === null) throw new Error("Invalid upload token: not a JSON object");
  const { apiKey, appId, regions, ingestHost } = raw as Record<string, unknown>;
  if (typeof apiKey !== "string" || typeof appId !== "string" || !Array.isArray(regions)) {
    throw new Error("Invalid upload token: expected { apiKey, appId, regions }");
  }
  const token: UploadToken = { apiKey, appId, regions: regions.map(String) };
  if (typeof ingestHost === "string") token.ingestHost = ingestHost;
  assertValid(token);
  return token;
}

function assertValid(token: UploadToken) {
  if (!token.apiKey.startsWith("sk_")) throw new Error("Invalid upload token: apiKey must start with sk_");
  if (!token.appId) throw new Error("Invalid upload token: appId is empty");
  if (token.regions.length === 0) throw new Error("Invalid upload token: regions must not be empty");
}
