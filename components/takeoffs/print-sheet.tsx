/**
 * Letter paper for a printed takeoff. The app header and the project tabs belong to layouts this page does
 * not own, so they are hidden here by what they are (the page's banner and the project section links).
 */
const CSS = `
@media print {
  @page { size: letter; margin: 0.5in; }
  html, body { background: #fff !important; }
  body, .min-h-screen { min-height: 0 !important; }
  body > * > header, nav[aria-label="Project sections"], main a[href$="/projects"] { display: none !important; }
  main { max-width: none !important; padding: 0 !important; }
  table { font-size: 9pt; page-break-inside: auto; }
  tr, figure { break-inside: avoid; }
  thead { display: table-header-group; }
  .overflow-x-auto { overflow: visible !important; }
}
`;

export function PrintSheet() {
  return <style href="takeoff-print" precedence="default">{CSS}</style>;
}
