import type { PriceGap } from "./price-gaps";

/** The price book cannot supply what a window needs (or an alternate casing it names). */
export class MissingItem extends Error {}

/** An opening type whose sizes and trim cannot be cut; `field` is the opening type's field (`trimSpec.apronInset`). */
export class OpeningTypeProblem extends Error {
  constructor(
    readonly mark: string,
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

/** The price book lacks what some windows need and placeholders were not asked for. */
export class PriceGaps extends MissingItem {
  constructor(readonly gaps: PriceGap[]) {
    const [first, ...rest] = gaps;
    super(
      `${first!.message} ${first!.fix}` +
        (rest.length ? ` Also: ${rest.map((g) => g.message).join(" ")}` : ""),
    );
  }
}
