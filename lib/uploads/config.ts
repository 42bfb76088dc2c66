import { localUploadToken } from "./token";

/**
 * The SDK reads its settings from process.env. With no UPLOADTHING_TOKEN configured we point it at the
 * local upload stand-in on loopback (demo, tests); production sets the real service's variables and
 * this changes nothing. Called by every module that talks to the upload service, before it does.
 */
export function pointAtUploadStandInUnlessConfigured() {
  const e = process.env;
  if (e.UPLOADTHING_TOKEN) return;
  const port = Number(e.UPLOAD_STAND_IN_PORT ?? 3900);
  e.UPLOADTHING_TOKEN = localUploadToken();
  e.UPLOADTHING_INGEST_URL ??= `http://127.0.0.1:${port}`;
  e.UPLOADTHING_API_URL ??= `http://127.0.0.1:${port}`;
  // generateSignedURL signs locally; the SDK only allows plain http for a host containing "local".
  e.UPLOADTHING_UFS_HOST ??= `localhost:${port}`;
  e.UPLOADTHING_UFS_APP_ID_LOCATION ??= "path";
  // The stand-in calls back the app at the request's origin unless told otherwise.
  if (!e.UPLOADTHING_CALLBACK_URL && e.NEXTAUTH_URL) e.UPLOADTHING_CALLBACK_URL = `${e.NEXTAUTH_URL.replace(/\/$/, "")}/api/uploadthing`;
}
