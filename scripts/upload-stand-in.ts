// The local upload stand-in as a process: `npm run demo` and the browser tests start it beside the app.
import { startUploadStandIn } from "@/scripts/stand-ins/upload";
import { localUploadToken } from "@/lib/uploads/token";

const port = Number(process.env.UPLOAD_STAND_IN_PORT ?? 3900);
const dataDir = process.env.UPLOAD_STAND_IN_DIR ?? ".data/uploads";
const token = process.env.UPLOADTHING_TOKEN || localUploadToken();

const trace = process.env.UPLOAD_STAND_IN_TRACE === "1";
const standIn = await startUploadStandIn({ port, dataDir, token, trace, log: (line) => console.error(`${new Date().toISOString()} ${line}`) });
console.log(`Upload stand-in on ${standIn.url}, keeping files in ${dataDir}`);

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.once(signal, () => void standIn.close().then(() => process.exit(0)));
}
