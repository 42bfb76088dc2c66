import highsLoader, { type Highs } from "highs";

let loading: Promise<Highs> | undefined;

/**
 * The HiGHS LP/MIP solver (University of Edinburgh, compiled to WebAssembly by
 * the `highs` package). Instantiating the WebAssembly takes tens of
 * milliseconds, so it is done once per process and shared.
 */
export function loadHighs(): Promise<Highs> {
  loading ??= highsLoader();
  return loading;
}

export type { Highs };

/** HiGHS model status code for a proven optimum (types.d.ts: ModelStatusCode 7). */
export const OPTIMAL = 7;
