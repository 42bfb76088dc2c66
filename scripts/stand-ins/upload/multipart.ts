import busboy, { type Busboy } from "busboy";
import { Transform, type Readable, type TransformCallback } from "node:stream";

/** The boundary from a `multipart/form-data; boundary=…` content type, or null if the body is not multipart. */
export function multipartBoundary(contentType: string | undefined): string | null {
  if (!contentType || !/^multipart\/form-data\b/i.test(contentType)) return null;
  const match = /;\s*boundary=(?:"([^"]{1,70})"|([^\s;]{1,70}))/i.exec(contentType);
  return match?.[1] ?? match?.[2] ?? null;
}

/**
 * Streams the bytes of the part named `file` out of a multipart body, and nothing else; busboy does the
 * parsing. It works chunk by chunk rather than buffering the body, for two reasons: uploads may be hundreds of
 * megabytes, and when a client drops the connection half way, every byte already seen must be on disk so the
 * upload can resume. Only the tail that could still turn out to be the closing delimiter is held back.
 * Throws a MultipartError (415) when busboy cannot read the content type.
 */
export class FilePartExtractor extends Transform {
  /** True once the whole `file` part has been seen, closing delimiter included. */
  complete = false;
  private readonly parser: Busboy;
  private file: Readable | null = null;
  private failure: MultipartError | null = null;
  private seen = 0;

  /** `maxBytes` bounds the whole body, so junk parts beside the file cannot stream in forever. */
  constructor(
    contentType: string,
    private readonly maxBytes = Number.POSITIVE_INFINITY,
  ) {
    super();
    try {
      this.parser = busboy({ headers: { "content-type": contentType } });
    } catch (error) {
      throw new MultipartError((error as Error).message, 415);
    }
    this.parser.on("file", (name, stream) => {
      stream.on("error", () => {}); // a cut-off part is reported through `complete`, not as an error
      if (name !== "file" || this.file) return void stream.resume();
      this.file = stream;
      stream.on("data", (chunk: Buffer) => this.push(chunk));
      stream.on("end", () => (this.complete = true));
    });
    // busboy takes a part without a filename for a form field; every FormData Blob has one, so refuse it.
    this.parser.on("field", (name) => {
      if (name === "file") this.fail(new MultipartError("The `file` part carries no filename, so it is not a file"));
    });
    this.parser.on("error", (error: Error) => this.fail(new MultipartError(error.message)));
  }

  override _transform(chunk: Buffer, _encoding: BufferEncoding, callback: TransformCallback) {
    this.seen += chunk.length;
    if (this.seen > this.maxBytes) return callback(new MultipartError("The body is larger than the file it carries", 413));
    if (this.failure || this.complete) return callback(this.failure); // after the file part nothing matters
    this.parser.write(chunk, () => callback(this.failure));
  }

  // Ending early is not an error here: after a dropped connection the caller still wants what was extracted,
  // and checks `complete` itself. busboy is never told the body ended (it would only object that the form is
  // cut off); what it already handed the file stream is let through first.
  override _flush(callback: TransformCallback) {
    const done = () => {
      this.parser.removeAllListeners("file");
      this.parser.destroy();
      callback(this.failure);
    };
    const file = this.file;
    if (!file || file.readableEnded || this.failure) return done();
    file.once("end", done);
    setImmediate(() => {
      if (file.readableEnded) return;
      file.off("end", done);
      done();
    });
  }

  private fail(error: MultipartError) {
    if (!this.complete) this.failure ??= error;
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
