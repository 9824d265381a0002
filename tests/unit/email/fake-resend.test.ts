import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { type FakeResend, startFakeResend } from "@/scripts/fake-resend.mjs";

let fake: FakeResend;
const auth = { authorization: "Bearer re_test", "content-type": "application/json" };

beforeAll(async () => {
  fake = await startFakeResend({ port: 0 });
});
afterAll(() => fake.close());

async function post(body: unknown, headers: Record<string, string> = auth) {
  const response = await fetch(`${fake.url}/emails`, { method: "POST", headers, body: JSON.stringify(body) });
  return { status: response.status, body: await response.json() };
}

describe("the fake e-mail service", () => {
  it("lists what it received newest first, shows one by id, and forgets on DELETE", async () => {
    const first = await post({ from: "a@example.test", to: "b@example.test", subject: "One", text: "1" });
    const second = await post({ from: "a@example.test", to: ["c@example.test"], subject: "Two", text: "2" });
    expect(first.status).toBe(200);
    const list = await (await fetch(`${fake.url}/emails`)).json();
    expect(list.data.map((email: { subject: string }) => email.subject)).toEqual(["Two", "One"]);
    const one = await (await fetch(`${fake.url}/emails/${second.body.id}`)).json();
    expect(one).toMatchObject({ id: second.body.id, to: ["c@example.test"] });
    expect((await fetch(`${fake.url}/emails`, { method: "DELETE" })).status).toBe(200);
    expect(fake.received()).toEqual([]);
  });

  it("answers a missing field and a missing key the way the real service does", async () => {
    expect(await post({ from: "a@example.test", to: "b@example.test" })).toEqual({
      status: 422,
      body: { statusCode: 422, name: "missing_required_field", message: "Missing `subject` field." },
    });
    expect((await post({ from: "a", to: "b", subject: "c" }, { "content-type": "application/json" })).body.name).toBe("missing_api_key");
    expect((await post("not an object")).status).toBe(422);
  });

  it("keeps attachments and refuses one without a file name or content, as the real service does", async () => {
    const attachment = { filename: "fitting.ics", content: "QkVHSU46VkNBTEVOREFS", content_type: "text/calendar" };
    const sent = await post({ from: "a@example.test", to: "b@example.test", subject: "Fitting", text: "1", attachments: [attachment] });
    expect((await (await fetch(`${fake.url}/emails/${sent.body.id}`)).json()).attachments).toEqual([attachment]);
    expect((await post({ from: "a@example.test", to: "b@example.test", subject: "x", attachments: [{ content: "QUJD" }] })).body).toMatchObject({
      name: "validation_error",
      message: "`attachments[0].filename` is missing.",
    });
    expect((await post({ from: "a@example.test", to: "b@example.test", subject: "x", attachments: [{ filename: "a.ics" }] })).status).toBe(422);
  });

  it("keeps one e-mail per idempotency key", async () => {
    const headers = { ...auth, "idempotency-key": "reset-once" };
    const email = { from: "a@example.test", to: "b@example.test", subject: "Once", text: "1" };
    const first = await post(email, headers);
    const again = await post(email, headers);
    expect(again.body.id).toBe(first.body.id);
    expect(fake.received().filter((received) => received.subject === "Once")).toHaveLength(1);
  });
});
