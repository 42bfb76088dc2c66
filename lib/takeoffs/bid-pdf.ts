import { PDFDocument, StandardFonts, rgb, type PDFFont, type PDFPage } from "pdf-lib";
import type { TakeoffResult } from "@/takeoff";
import { usd } from "./format";

export interface BidDocument {
  orgName: string;
  project: { name: string; generalContractor: string | null; bidDue: string | null };
  takeoffName: string;
  priceBookName: string;
  pricesAsOf: Date;
  result: TakeoffResult;
  issuedAt: Date;
  validDays: number;
}

// The standard PDF fonts speak WinAnsi only; anything else a person typed prints as "?" rather than failing.
const WIN_ANSI_EXTRA = "€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ";
const safe = (t: string) => [...t].map((c) => ((c >= " " && c <= "~") || (c >= "\u00a0" && c <= "\u00ff") || WIN_ANSI_EXTRA.includes(c) ? c : "?")).join("");
const day = (d: Date) => d.toLocaleDateString("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" });

const SPRUCE = rgb(0.14, 0.345, 0.251);
const GRAPHITE = rgb(0.12, 0.13, 0.145);
const ALARM = rgb(0.706, 0.137, 0.094);

class Writer {
  y = 740;
  constructor(
    private page: PDFPage,
    private font: PDFFont,
    private bold: PDFFont,
  ) {}
  text(t: string, opts: { size?: number; bold?: boolean; x?: number; color?: ReturnType<typeof rgb> } = {}) {
    this.page.drawText(safe(t), { x: opts.x ?? 56, y: this.y, size: opts.size ?? 10, font: opts.bold ? this.bold : this.font, color: opts.color ?? GRAPHITE });
  }
  line(t: string, opts: Parameters<Writer["text"]>[1] & { gap?: number } = {}) {
    this.text(t, opts);
    this.y -= opts.gap ?? (opts.size ?? 10) + 5;
  }
  /** Wraps a paragraph to the text block's width. */
  para(t: string, size = 10) {
    const words = safe(t).split(/\s+/);
    let current = "";
    for (const w of words) {
      const next = current ? `${current} ${w}` : w;
      if (this.font.widthOfTextAtSize(next, size) > 500 && current) {
        this.line(current, { size });
        current = w;
      } else current = next;
    }
    if (current) this.line(current, { size });
    this.y -= 4;
  }
  amountRow(label: string, amount: number, bold = false) {
    this.text(label, { bold });
    const s = usd(amount);
    this.text(s, { bold, x: 556 - (bold ? this.bold : this.font).widthOfTextAtSize(s, 10) });
    this.y -= 15;
  }
  rule() {
    this.page.drawLine({ start: { x: 56, y: this.y + 10 }, end: { x: 556, y: this.y + 10 }, thickness: 0.5, color: GRAPHITE });
    this.y -= 4;
  }
}

/** The bid summary for the general contractor, on US letter: scope, totals, exclusions, assumptions, validity. */
export async function bidSummaryPdf(doc: BidDocument): Promise<Uint8Array> {
  const pdf = await PDFDocument.create();
  pdf.setTitle(safe(`${doc.project.name} — window trim bid`));
  pdf.setAuthor(safe(doc.orgName));
  pdf.setCreator("Miterwise");
  pdf.setCreationDate(doc.issuedAt);
  const page = pdf.addPage([612, 792]);
  const w = new Writer(page, await pdf.embedFont(StandardFonts.Helvetica), await pdf.embedFont(StandardFonts.HelveticaBold));
  const { result } = doc;
  const validUntil = new Date(doc.issuedAt.getTime() + doc.validDays * 86_400_000);

  w.line(doc.orgName, { size: 18, bold: true, color: SPRUCE, gap: 26 });
  w.line("Interior window trim — bid summary", { size: 13, bold: true, gap: 22 });
  w.line(`Project: ${doc.project.name}`);
  w.line(`To: ${doc.project.generalContractor ?? "General contractor"}`);
  w.line(`Issued: ${day(doc.issuedAt)}    Valid until: ${day(validUntil)}${doc.project.bidDue ? `    Bid due: ${doc.project.bidDue}` : ""}`);
  w.line(`Reference: ${doc.takeoffName}`, { gap: 22 });
  const placeholders = result.placeholders ?? [];
  if (placeholders.length > 0) {
    // A placeholder is a guess the price book never confirmed: say so before any figure.
    w.line("DRAFT — NOT A BID: some prices are placeholders", { bold: true, size: 12, color: ALARM, gap: 16 });
    for (const p of placeholders) w.para(`• ${p.itemName.replace(/^PLACEHOLDER /, "")} for ${p.marks.join(", ")}, priced ${p.basis}.`);
    w.para("Add these items to the price book and run the takeoff again; it cannot be submitted until then.");
  }

  w.line("Scope", { bold: true, size: 11 });
  const types = result.openingTypes.filter((o) => o.quantity > 0);
  w.para(
    `Supply and install interior trim at ${result.openingsTotal} windows: ` +
      types.map((o) => `${o.mark} × ${o.quantity} (${o.spec.style === "picture-frame" ? "picture-frame casing" : "casing, stool and apron"})`).join(", ") +
      ". Jamb extensions where the wall is deeper than the window frame. Materials per the schedule of window types.",
  );

  w.line("Totals", { bold: true, size: 11 });
  w.amountRow("Material", result.bid.material);
  w.amountRow("Labour", result.bid.labour);
  w.amountRow("Markup", result.bid.markup);
  w.amountRow("Sales tax", result.bid.tax);
  w.rule();
  w.amountRow(placeholders.length > 0 ? "Bid total (with placeholder prices)" : "Bid total", result.bid.total, true);
  w.y -= 10;

  w.line("Exclusions", { bold: true, size: 11 });
  for (const x of [
    "Painting, staining and caulking for finish; exterior trim; window supply, installation and flashing.",
    "Drywall repair and returns; blocking; work at openings not shown on the plans.",
  ])
    w.para(`• ${x}`);
  w.line("Assumptions", { bold: true, size: 11 });
  for (const x of [
    `Quantities are those tagged on the plan set (${result.openingsTotal} windows); changes to the plans are priced separately.`,
    "Jamb extension widths follow the window list; openings are square, plumb and ready for trim.",
    `Prices from "${doc.priceBookName}" as of ${day(doc.pricesAsOf)}.`,
  ])
    w.para(`• ${x}`);

  w.y = Math.min(w.y, 90);
  w.para("This bid prices material and labour; it does not certify compliance with any code. Work follows local building codes and licensed practice.", 8);
  return pdf.save();
}
