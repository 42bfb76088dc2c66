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

/**
 * A fixed token for the demo and the tests. It protects nothing — the stand-in listens on loopback only —
 * but it has the shape the SDK insists on (`sk_` prefix, at least one region).
 */
export const LOCAL_UPLOAD_TOKEN: Readonly<UploadToken> = Object.freeze({
  apiKey: "sk_local_miterwise_stand_in_not_a_secret",
  appId: "miterwiselocal",
  regions: ["local1"],
});

export function encodeUploadToken(token: UploadToken): string {
  assertValid(token);
  const body: UploadToken = { apiKey: token.apiKey, appId: token.appId, regions: [...token.regions] };
  if (token.ingestHost) body.ingestHost = token.ingestHost;
  return Buffer.from(JSON.stringify(body), "utf8").toString("base64");
}

/** The local default, encoded — what `UPLOADTHING_TOKEN` is set to when nothing else is configured. */
export function localUploadToken(): string {
  return encodeUploadToken({ ...LOCAL_UPLOAD_TOKEN, regions: [...LOCAL_UPLOAD_TOKEN.regions] });
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
