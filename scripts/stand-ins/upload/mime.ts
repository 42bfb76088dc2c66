/**
 * When a browser reports no MIME type for a file, the SDK signs the matched route key instead (`pdf`, `image`,
 * `blob`, …). Files are served with a real content type, so map those back: by the file's extension first,
 * then by the route key, else a byte stream.
 */
const BY_EXTENSION: Record<string, string> = {
  pdf: "application/pdf",
  png: "image/png",
  jpg: "image/jpeg",
  jpeg: "image/jpeg",
  gif: "image/gif",
  webp: "image/webp",
  svg: "image/svg+xml",
  tif: "image/tiff",
  tiff: "image/tiff",
  txt: "text/plain",
  csv: "text/csv",
  json: "application/json",
  zip: "application/zip",
  dwg: "image/vnd.dwg",
  dxf: "image/vnd.dxf",
};

const BY_ROUTE_KEY: Record<string, string> = {
  pdf: "application/pdf",
  text: "text/plain",
};

const MIME = /^[a-z0-9!#$&^_.+-]+\/[a-z0-9!#$&^_.+-]+$/i;

export function resolveContentType(signedType: string, fileName: string): string {
  if (MIME.test(signedType)) return signedType.toLowerCase();
  const ext = /\.([a-z0-9]+)$/i.exec(fileName)?.[1]?.toLowerCase();
  const byExt = ext ? BY_EXTENSION[ext] : undefined;
  return byExt ?? BY_ROUTE_KEY[signedType] ?? "application/octet-stream";
}
