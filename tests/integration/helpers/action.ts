/**
 * Server actions read the request through next/headers. Outside Next.js there is no request, so the
 * test supplies one: the same session cookie a browser would send. Everything after that is real.
 */
let cookieHeader: string | undefined;

export function actAs(cookie: string | undefined) {
  cookieHeader = cookie;
}

function cookieList() {
  return (cookieHeader ?? "")
    .split(";")
    .map((c) => c.trim())
    .filter(Boolean)
    .map((c) => ({ name: c.slice(0, c.indexOf("=")), value: c.slice(c.indexOf("=") + 1) }));
}

export const nextHeadersMock = {
  headers: async () => new Headers(cookieHeader ? { cookie: cookieHeader } : {}),
  cookies: async () => ({ getAll: cookieList, get: (n: string) => cookieList().find((c) => c.name === n) }),
};

export function runAction<T>(action: (prev: null, fd: FormData) => Promise<T>, fields: Record<string, string>) {
  const fd = new FormData();
  for (const [k, v] of Object.entries(fields)) fd.set(k, v);
  return action(null, fd);
}
