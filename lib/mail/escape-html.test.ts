import { expect, it } from "vitest";
import { escapeHtml } from "./escape-html";

it("escapes the five characters that can change HTML meaning", () => {
  expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe("&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;");
});
