// Runs once when a server starts: importing the environment module validates every setting, so a
// misconfigured deployment stops at boot with a list of what is wrong instead of failing later.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") await import("@/lib/env");
}
