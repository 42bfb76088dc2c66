import { createHash } from "node:crypto";
import { createReadStream } from "node:fs";
import { mkdir, open, readdir, readFile, rename, rm, stat, writeFile } from "node:fs/promises";
import path from "node:path";
import type { Writable } from "node:stream";

/** The small JSON sidecar kept next to each stored file; its presence is what marks an upload as complete. */
export type StoredFile = {
  key: string;
  name: string;
  type: string;
  size: number;
  customId: string | null;
  /** md5 hex of the bytes, as the hosted service reports it. */
  fileHash: string;
  contentDisposition: "inline" | "attachment";
  acl: string | null;
  uploadedAt: number;
};

/**
 * Keys come from the SDK's key generator (letters and digits only); anything else is refused before it gets
 * near a path, so a key can never name a file outside the data folder.
 */
const KEY = /^[A-Za-z0-9_-]{1,128}$/;
export const isValidKey = (key: string) => KEY.test(key);

/**
 * Files on disk under `dataDir`: `partial/{key}` while bytes arrive (its length is the resume point, and it
 * survives a restart), then `files/{key}` plus `files/{key}.json` once the last byte is in.
 */
export class UploadStore {
  private readonly filesDir: string;
  private readonly partialDir: string;

  constructor(dataDir: string) {
    const root = path.resolve(dataDir);
    this.filesDir = path.join(root, "files");
    this.partialDir = path.join(root, "partial");
  }

  async init() {
    await mkdir(this.filesDir, { recursive: true });
    await mkdir(this.partialDir, { recursive: true });
  }

  bytesPath(key: string) {
    return this.inside(this.filesDir, key);
  }

  /** Bytes received so far for an unfinished upload (0 when none). */
  async partialSize(key: string): Promise<number> {
    try {
      return (await stat(this.inside(this.partialDir, key))).size;
    } catch (error) {
      if (isMissing(error)) return 0;
      throw error;
    }
  }

  /** A stream appending at `start`: anything past it is cut first, so a client may resend from an earlier point. */
  async openPartial(key: string, start: number): Promise<Writable> {
    const handle = await open(this.inside(this.partialDir, key), "a");
    try {
      await handle.truncate(start);
    } catch (error) {
      await handle.close();
      throw error;
    }
    return handle.createWriteStream();
  }

  /** Moves a complete partial into place and writes its sidecar; the sidecar goes last so readers never see half. */
  async finalize(meta: Omit<StoredFile, "fileHash" | "uploadedAt">): Promise<StoredFile> {
    const partial = this.inside(this.partialDir, meta.key);
    const fileHash = await md5(partial);
    const stored: StoredFile = { ...meta, fileHash, uploadedAt: Date.now() };
    const sidecar = this.sidecarPath(meta.key);
    await writeFile(`${sidecar}.tmp`, JSON.stringify(stored, null, 2));
    await rename(partial, this.bytesPath(meta.key));
    await rename(`${sidecar}.tmp`, sidecar);
    return stored;
  }

  async get(key: string): Promise<StoredFile | null> {
    if (!isValidKey(key)) return null;
    try {
      const parsed = JSON.parse(await readFile(this.sidecarPath(key), "utf8")) as StoredFile;
      return parsed.key === key ? parsed : null;
    } catch (error) {
      if (isMissing(error) || error instanceof SyntaxError) return null;
      throw error;
    }
  }

  async update(key: string, patch: Partial<Pick<StoredFile, "name" | "acl">>): Promise<boolean> {
    const current = await this.get(key);
    if (!current) return false;
    const sidecar = this.sidecarPath(key);
    await writeFile(`${sidecar}.tmp`, JSON.stringify({ ...current, ...patch }, null, 2));
    await rename(`${sidecar}.tmp`, sidecar);
    return true;
  }

  /** Removes a file and anything half-uploaded under its key; true when a stored file was there. */
  async remove(key: string): Promise<boolean> {
    if (!isValidKey(key)) return false;
    const existed = (await this.get(key)) !== null;
    await rm(this.sidecarPath(key), { force: true });
    await rm(this.bytesPath(key), { force: true });
    await rm(this.inside(this.partialDir, key), { force: true });
    return existed;
  }

  async list(): Promise<StoredFile[]> {
    const names = await readdir(this.filesDir);
    const keys = names.filter((n) => n.endsWith(".json")).map((n) => n.slice(0, -".json".length));
    const files = await Promise.all(keys.map((k) => this.get(k)));
    return files.filter((f): f is StoredFile => f !== null).sort((a, b) => b.uploadedAt - a.uploadedAt);
  }

  /** Resolves keys or customIds (the SDK's two ways of naming files) to stored files. */
  async resolve(ids: { fileKeys?: unknown; customIds?: unknown }): Promise<StoredFile[]> {
    const wanted = (v: unknown) => (Array.isArray(v) ? v.filter((x): x is string => typeof x === "string") : []);
    const keys = wanted(ids.fileKeys);
    const customIds = new Set(wanted(ids.customIds));
    if (customIds.size > 0) return (await this.list()).filter((f) => f.customId !== null && customIds.has(f.customId));
    const found = await Promise.all(keys.map((k) => this.get(k)));
    return found.filter((f): f is StoredFile => f !== null);
  }

  private sidecarPath(key: string) {
    return `${this.bytesPath(key)}.json`;
  }

  /** Second line of defence after the key check: the resolved path must stay inside the folder. */
  private inside(dir: string, key: string) {
    if (!isValidKey(key)) throw new Error(`Invalid file key: ${JSON.stringify(key)}`);
    const full = path.resolve(dir, key);
    if (path.dirname(full) !== dir) throw new Error(`Invalid file key: ${JSON.stringify(key)}`);
    return full;
  }
}

function isMissing(error: unknown) {
  return (error as NodeJS.ErrnoException | null)?.code === "ENOENT";
}

function md5(file: string): Promise<string> {
  return new Promise((resolve, reject) => {
    const hash = createHash("md5");
    createReadStream(file)
      .on("data", (chunk) => hash.update(chunk))
      .on("error", reject)
      .on("end", () => resolve(hash.digest("hex")));
  });
}
