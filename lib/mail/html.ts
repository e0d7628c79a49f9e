// HTML for mail bodies. Every interpolated value is escaped unless it is
// already SafeHtml (built by this same tag), so a branch, version or case name
// that carries markup arrives as text, never as markup.

export class SafeHtml {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

const ENTITIES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ENTITIES[c]);
}

function render(value: unknown): string {
  if (value instanceof SafeHtml) return value.value;
  if (Array.isArray(value)) return value.map(render).join("");
  if (value === null || value === undefined || value === false) return "";
  return escapeHtml(String(value));
}

export function html(strings: TemplateStringsArray, ...values: unknown[]): SafeHtml {
  let out = strings[0];
  for (let i = 0; i < values.length; i++) out += render(values[i]) + strings[i + 1];
  return new SafeHtml(out);
}

/** A link only to http(s) addresses; anything else is shown as plain text. */
export function link(href: string, text: string): SafeHtml {
  if (!/^https?:\/\//i.test(href)) return html`${text}`;
  return html`<a href="${href}" style="color:#1b5f59">${text}</a>`;
}
