import { createHash, randomBytes } from "node:crypto";

/** 32 random bytes, URL-safe. Only its SHA-256 is stored, so a leaked table cannot be replayed as links. */
export const newInviteToken = () => randomBytes(32).toString("base64url");
export const hashInviteToken = (token: string) => createHash("sha256").update(token).digest("hex");

export const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;
