import { readdir, readFile } from "node:fs/promises";
import path from "node:path";

export interface OutboxMessage {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  date: string;
}

/** Messages the stand-in kept, newest first. An outbox that does not exist yet is simply empty. */
export async function readOutbox(dir: string): Promise<OutboxMessage[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith(".json"));
  } catch {
    return [];
  }
  const messages = await Promise.all(
    names.map(async (n) => JSON.parse(await readFile(path.join(dir, n), "utf8")) as OutboxMessage),
  );
  return messages.sort((a, b) => b.id.localeCompare(a.id));
}
