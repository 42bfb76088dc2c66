import { Transform, type TransformCallback } from "node:stream";

const MAX_PART_HEADERS = 16 * 1024;

/** The boundary from a `multipart/form-data; boundary=…` content type, or null if the body is not multipart. */
export function multipartBoundary(contentType: string | undefined): string | null {
  if (!contentType || !/^multipart\/form-data\b/i.test(contentType)) return null;
  const match = /;\s*boundary=(?:"([^"]{1,70})"|([^\s;]{1,70}))/i.exec(contentType);
  return match?.[1] ?? match?.[2] ?? null;
}

/**
 * Streams the bytes of the part named `file` out of a multipart body, and nothing else. It works chunk by
 * chunk rather than buffering the body, for two reasons: uploads may be hundreds of megabytes, and when a
 * client drops the connection half way, every byte already seen must be on disk so the upload can resume.
 * Only the tail that could still turn out to be the closing delimiter is held back.
 */
export class FilePartExtractor extends Transform {
  /** True once the whole `file` part has been seen, closing delimiter included. */
  complete = false;
  private readonly dashBoundary: Buffer;
  private readonly delimiter: Buffer;
  private state: "preamble" | "headers" | "file" | "skip" | "done" = "preamble";
  private pending: Buffer = Buffer.alloc(0);
  private seen = 0;

  /** `maxBytes` bounds the whole body, so junk parts beside the file cannot stream in forever. */
  constructor(
    boundary: string,
    private readonly maxBytes = Number.POSITIVE_INFINITY,
  ) {
    super();
    this.dashBoundary = Buffer.from(`--${boundary}`, "latin1");
    this.delimiter = Buffer.from(`\r\n--${boundary}`, "latin1");
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, callback: TransformCallback) {
    try {
      this.seen += chunk.length;
      if (this.seen > this.maxBytes) throw new MultipartError("The body is larger than the file it carries", 413);
      this.pending = this.pending.length ? Buffer.concat([this.pending, chunk]) : chunk;
      this.advance();
      callback();
    } catch (error) {
      callback(error as Error);
    }
  }

  // Ending early is not an error here: after a dropped connection the caller still wants what was extracted,
  // and checks `complete` itself.
  override _flush(callback: TransformCallback) {
    callback();
  }

  private advance() {
    for (;;) {
      if (this.state === "done") {
        this.pending = Buffer.alloc(0);
        return;
      }
      if (this.state === "preamble") {
        const at = this.pending.indexOf(this.dashBoundary);
        if (at < 0) {
          this.pending = this.pending.subarray(Math.max(0, this.pending.length - this.dashBoundary.length));
          return;
        }
        this.pending = this.pending.subarray(at + this.dashBoundary.length);
        this.state = "headers";
        continue;
      }
      if (this.state === "headers") {
        if (this.pending.length < 2) return;
        if (this.pending.subarray(0, 2).toString("latin1") === "--") {
          this.state = "done"; // the closing delimiter: no (more) parts
          continue;
        }
        const end = this.pending.indexOf("\r\n\r\n");
        if (end < 0) {
          if (this.pending.length > MAX_PART_HEADERS) throw new MultipartError("Part headers too large");
          return;
        }
        const headers = this.pending.subarray(0, end).toString("latin1");
        this.pending = this.pending.subarray(end + 4);
        this.state = partName(headers) === "file" ? "file" : "skip";
        continue;
      }
      // "file" or "skip": body bytes up to the next delimiter.
      const at = this.pending.indexOf(this.delimiter);
      if (at < 0) {
        const safe = this.pending.length - (this.delimiter.length - 1);
        if (safe > 0) {
          if (this.state === "file") this.push(this.pending.subarray(0, safe));
          this.pending = this.pending.subarray(safe);
        }
        return;
      }
      if (this.state === "file") {
        if (at > 0) this.push(this.pending.subarray(0, at));
        this.complete = true;
        this.state = "done";
        continue;
      }
      this.pending = this.pending.subarray(at + this.delimiter.length);
      this.state = "headers";
    }
  }
}

export class MultipartError extends Error {
  constructor(
    message: string,
    readonly status = 400,
  ) {
    super(message);
  }
}

function partName(headers: string): string | null {
  const disposition = headers.split("\r\n").find((line) => /^content-disposition:/i.test(line.trim()));
  return disposition ? (/\bname="([^"]*)"/i.exec(disposition)?.[1] ?? null) : null;
}
