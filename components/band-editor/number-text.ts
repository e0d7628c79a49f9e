// A number as a person types it into a band or fit-setting field. Accepts the
// plain decimal and exponent forms engineers use (0.41, 1.2e-3, 4.8504E6) and the
// true minus sign the app itself prints (−0.5), so a value copied from a page can
// be pasted back. An empty box means "no value" (an open limit, an unset setting).

export type ParsedNumber = { ok: true; value: number | null } | { ok: false; message: string };

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

export function parseNumberText(text: string): ParsedNumber {
  const t = text.trim().replace(/[\u2212\u2013]/g, "-");
  if (t === "") return { ok: true, value: null };
  if (/^[+-]?\d+,\d+$/.test(t)) return { ok: false, message: "use a point as the decimal separator" };
  if (!NUMBER.test(t)) return { ok: false, message: `is not a number: "${text.trim()}"` };
  const value = Number(t);
  if (!Number.isFinite(value)) return { ok: false, message: "is too large to store" };
  return { ok: true, value };
}
