// GET|POST /api/uploadthing — the upload SDK's handshake: presign plan-set PDFs, receive the service's callback
import { createRouteHandler } from "uploadthing/next";
import { planRouter } from "./core";

export const { GET, POST } = createRouteHandler({ router: planRouter });
