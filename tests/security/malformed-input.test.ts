import { describe, expect, it } from "vitest";
import { z } from "zod";
import { maxJsonBodyBytes, parseJsonBody, readBodyBytes } from "@/lib/api/body";
import { parseQuery } from "@/lib/api/query";
import { isWellFormedReply } from "@/lib/security/page-post";
import { pathDecodes } from "@/lib/security/path-segments";
import { lineText, multiLineText } from "@/lib/validation/text";
import { hasControlCharacters } from "@/lib/validation/text-rules";

describe("the text rule", () => {
  it("refuses NUL, the other C0 controls, DEL and the C1 controls in a one-line field", () => {
    for (const text of ["a\u0000b", "\u0001", "a\u001bb", "a\u007fb", "a\u0085b", "a\tb", "a\nb", "a\rb"]) expect(lineText().safeParse(text).success, JSON.stringify(text)).toBe(false);
    for (const text of ["Rosa Iverley", "2019 family SUV", "Ærø – 225/45R17 “XL”", ""]) expect(lineText().safeParse(text).success, text).toBe(true);
  });

  it("keeps tab, line feed and carriage return in a multi-line field, and nothing else", () => {
    expect(multiLineText().safeParse("Four tires\r\n\tfitted Thursday").success).toBe(true);
    expect(multiLineText().safeParse("Four\u0000tires").success).toBe(false);
    expect(hasControlCharacters("a\u000bb", { multiLine: true })).toBe(true);
  });
});

const json = (body: BodyInit | null, headers: Record<string, string> = { "content-type": "application/json" }) =>
  new Request("http://localhost:3000/x", { method: "POST", headers, body, ...(body instanceof ReadableStream ? { duplex: "half" } : {}) } as RequestInit);

describe("a JSON body", () => {
  const schema = z.object({ note: z.string().optional(), items: z.array(z.object({ name: z.string() })).optional() });

  it("with a control character anywhere is refused with 400 naming the field", async () => {
    const result = await parseJsonBody(json(JSON.stringify({ items: [{ name: "ok" }, { name: "bad\u0000" }] })), schema);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.response.status).toBe(400);
    expect((await result.response.json()).error).toEqual({
      code: "invalid_parameter",
      message: 'The field "items.1.name" is invalid: Remove the control characters (such as NUL) from this text.',
      field: "items.1.name",
    });
  });

  it("is refused by its declared Content-Length before a byte is read", async () => {
    let pulled = 0;
    const stream = new ReadableStream<Uint8Array>({ pull: (controller) => void (pulled += 1, controller.enqueue(new Uint8Array(1024))) });
    const read = await readBodyBytes(json(stream, { "content-type": "application/json", "content-length": String(100 * 1024 * 1024) }), maxJsonBodyBytes);
    expect(read.ok).toBe(false);
    expect(pulled).toBeLessThanOrEqual(1);
  });

  it("without a length, or with a false one, is read only until it passes the limit", async () => {
    let sent = 0;
    const endless = new ReadableStream<Uint8Array>({
      pull: (controller) => {
        sent += 16 * 1024;
        controller.enqueue(new Uint8Array(16 * 1024).fill(0x20));
      },
    });
    const read = await readBodyBytes(json(endless, { "content-type": "application/json", "content-length": "10" }), maxJsonBodyBytes);
    expect(read.ok).toBe(false);
    expect(sent).toBeLessThanOrEqual(maxJsonBodyBytes + 2 * 16 * 1024);
  });

  it("over 64 KB answers 413 too_large; one of another type answers 415", async () => {
    const big = await parseJsonBody(json(JSON.stringify({ note: "x".repeat(maxJsonBodyBytes) })), schema);
    expect(!big.ok && big.response.status).toBe(413);
    const text = await parseJsonBody(json("{}", { "content-type": "text/plain" }), schema);
    expect(!text.ok && (await text.response.json()).error.code).toBe("unsupported_media_type");
  });
});

describe("a query", () => {
  it("with a control character in a value or a name is refused with 400 naming it; a line break in a value is left to its field's rule", () => {
    const schema = z.object({ q: z.string().optional() });
    const refused = parseQuery(new URL("http://localhost:3000/x?q=a%00b"), schema);
    expect(refused.ok).toBe(false);
    expect(parseQuery(new URL("http://localhost:3000/x?a%01=1"), schema).ok).toBe(false);
    expect(parseQuery(new URL("http://localhost:3000/x?q=285%2F50R20%0A119S"), schema).ok).toBe(true);
  });
});

describe("a path", () => {
  it("decodes only as percent-encoded UTF-8 (RFC 3986 §2.1, RFC 3629 §3)", () => {
    for (const path of ["/s/%FF", "/size/%", "/learn/%ED%A0%80", "/api/v1/fit-cards/%FF", "/counter/items/%E2%82", "/x/%G0"]) expect(pathDecodes(path), path).toBe(false);
    for (const path of ["/", "/size/285-50R20", "/size/285%2F50R20", "/learn/%C3%A9t%C3%A9", "/s/%00"]) expect(pathDecodes(path), path).toBe(true);
  });
});

describe("a server action's arguments", () => {
  it("are taken as the app's forms send them: a JSON array of plain values, form references only in multipart", () => {
    expect(isWellFormedReply('[{"userId":"abc","role":"staff"}]', false)).toBe(true);
    expect(isWellFormedReply('["$K1"]', true)).toBe(true);
    expect(isWellFormedReply('[{"note":"$$5 off","gone":"$undefined"}]', false)).toBe(true);
  });

  it("are refused when React's decoder would throw: not JSON, not an array, or any other $ reference", () => {
    for (const body of ["garbage", "", "[", "null", "1", '"x"', '{"a":1}', '["$Q1"]', '["$1"]', '[{"a":"$h1"}]', '["$K1"]', '["$W1"]', '["$S"]', '["$9999999999999"]']) {
      expect(isWellFormedReply(body, false), body).toBe(false);
    }
    expect(isWellFormedReply('["$Q1"]', true)).toBe(false);
  });
});
