import { describe, expect, it } from "vitest";
import { escapeHtml, html, link } from "@/lib/mail/html";

describe("html tag", () => {
  it("escapes every interpolated value, including in attributes", () => {
    const name = `"><img src=x onerror=alert(1)>`;
    expect(html`<p title="${name}">${name}</p>`.value).toBe(
      '<p title="&quot;&gt;&lt;img src=x onerror=alert(1)&gt;">&quot;&gt;&lt;img src=x onerror=alert(1)&gt;</p>',
    );
  });

  it("keeps HTML it built itself, joins arrays and drops null, undefined and false", () => {
    const items = ["a<b", "c&d"].map((t) => html`<li>${t}</li>`);
    expect(html`<ul>${items}${null}${undefined}${false}</ul>`.value).toBe("<ul><li>a&lt;b</li><li>c&amp;d</li></ul>");
  });

  it("escapes the five characters that matter in HTML text and attributes", () => {
    expect(escapeHtml(`&<>"'`)).toBe("&amp;&lt;&gt;&quot;&#39;");
  });

  it("links only http(s) addresses; a javascript: address stays plain text", () => {
    expect(link("https://ci.fenwick-hydro.test/p/1", "CI").value).toContain('href="https://ci.fenwick-hydro.test/p/1"');
    expect(link("javascript:alert(1)", "CI").value).toBe("CI");
  });
});
