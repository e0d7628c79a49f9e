import { describe, expect, it } from "vitest";
import { Utf8Response } from "@/lib/http/utf8-response";

// The reference is the platform's own Response (undici, the WHATWG fetch
// standard): a text body is a USVString, lone surrogates become U+FFFD, and the
// bytes are its UTF-8 encoding (Fetch standard, "extract a body"; WHATWG
// Encoding standard, UTF-8 encoder).

const texts: [string, string][] = [
  ["ASCII JSON", '{"data":{"build":{"id":"1","verdict":"within"}}}'],
  ["Latin-1 and Greek (units, labels, citations)", "κ = 0.41 § 7.1 m² Kármán – −"],
  ["astral characters (a surrogate pair)", "run 🚀 𝜅"],
  ["a lone high surrogate", "a\ud800b"],
  ["a lone low surrogate", "a\udc00b"],
  ["a reversed pair", "\udc00\ud800"],
  ["a high surrogate at the end", "end\ud83d"],
  ["JSON.stringify of a lone surrogate (escaped)", JSON.stringify({ s: "\ud800" })],
  ["empty", ""],
];

describe("Utf8Response", () => {
  it.each(texts)("gives the same bytes as the standard Response for %s", async (_name, text) => {
    const ours = new Uint8Array(await new Utf8Response(text).arrayBuffer());
    const standard = new Uint8Array(await new Response(text).arrayBuffer());
    expect(ours).toEqual(standard);
    expect(await new Utf8Response(text).text()).toBe(await new Response(text).text());
  });

  it("keeps the standard's Content-Type for a text body without one", () => {
    expect(new Utf8Response("x").headers.get("content-type")).toBe(new Response("x").headers.get("content-type"));
  });

  it("keeps a given Content-Type, status and other headers", () => {
    const r = new Utf8Response('{"a":1}', { status: 400, statusText: "Bad Request", headers: { "Content-Type": "application/json; charset=utf-8", "x-a": "1" } });
    expect(r.status).toBe(400);
    expect(r.statusText).toBe("Bad Request");
    expect(r.headers.get("content-type")).toBe("application/json; charset=utf-8");
    expect(r.headers.get("x-a")).toBe("1");
  });

  it("passes other bodies through as the standard Response does", async () => {
    expect(new Utf8Response(null, { status: 204 }).body).toBeNull();
    const bytes = new Uint8Array([1, 2, 3]);
    expect(new Uint8Array(await new Utf8Response(bytes).arrayBuffer())).toEqual(bytes);
    expect(new Utf8Response(bytes).headers.get("content-type")).toBeNull();
    const params = new URLSearchParams({ a: "κ" });
    expect(new Utf8Response(params).headers.get("content-type")).toBe(new Response(params).headers.get("content-type"));
    expect(await new Utf8Response(params).text()).toBe("a=%CE%BA");
  });
});
