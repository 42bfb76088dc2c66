// The app's production server: `npm start` (and the demo, the browser tests, the benchmarks) run this instead
// of `next start`. Usage: node scripts/serve.mjs [-H host] [-p port] [--dev]
//
// Route handlers never see the socket, and Next.js keeps any X-Forwarded-For the client sent, so a client could
// name any address it liked. This server writes the socket's peer address into `x-miterwise-peer` (replacing
// any copy the client sent), prefixed with a random token only this process knows; lib/auth/client-address.ts
// believes the header only with that token. It also tells the app which address it listens on, so pages meant
// for this machine only (the demo outbox) can check.
import { randomBytes } from "node:crypto";
import { createServer } from "node:http";
import next from "next";

const args = process.argv.slice(2);
const option = (short, long, fallback) => {
  const at = args.findIndex((a) => a === short || a === long);
  return at >= 0 && args[at + 1] ? args[at + 1] : fallback;
};
const hostname = option("-H", "--hostname", process.env.HOSTNAME || "0.0.0.0");
const port = Number(option("-p", "--port", process.env.PORT || "3000"));
const dev = args.includes("--dev");
if (!Number.isInteger(port) || port < 1 || port > 65535) {
  console.error(`Invalid port: ${port}`);
  process.exit(1);
}

process.env.MITERWISE_PEER_TOKEN = randomBytes(24).toString("hex");
process.env.MITERWISE_LISTEN_HOST = hostname;
const PEER = "x-miterwise-peer";

const app = next({ dev, hostname, port });
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  delete req.headers[PEER];
  req.headers[PEER] = `${process.env.MITERWISE_PEER_TOKEN} ${req.socket.remoteAddress ?? ""}`;
  handle(req, res).catch((error) => {
    console.error(error);
    if (!res.headersSent) res.writeHead(500).end("Internal error");
  });
});
server.listen(port, hostname, () => console.log(`Miterwise listening on http://${hostname.includes(":") ? `[${hostname}]` : hostname}:${port}`));
for (const signal of ["SIGINT", "SIGTERM"]) {
  process.once(signal, () => server.close(() => process.exit(0)));
}
