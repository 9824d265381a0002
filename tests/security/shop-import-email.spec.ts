import { expect, test } from "@playwright/test";
import { client, freshAddress } from "./http";

// The import and the e-mails seen from outside: over HTTP, against the production build.
const inbox = `${process.env.E2E_FAKE_RESEND_URL ?? "http://127.0.0.1:3226"}/emails`;
const HEADER = "sku,brand,line,size,load_index,speed_symbol,price,quantity";
// Control characters (C0, DEL, C1) never belong in a header field (RFC 5322 section 2.2: a header
// field is printable characters; folding is the only line break, and this app never folds).
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/;

test("an import whose rows end in LF and CRLF behind a byte-order mark reads every row", async ({ baseURL }) => {
  const staff = await client(baseURL!, "staff@sidewise.test");
  const prefix = `EOL-${Date.now().toString(36).toUpperCase()}`;
  const rows = [
    `${prefix}-1,Quensal,Aldermoor Tour,225/65R17,102,H,"$1,204.50",8`,
    `${prefix}-2,Velmora,Estrelle GT,225/45R17,94,V,189.50,6`,
    `${prefix}-3,Quensal,Aldermoor Tour,215/60R16,95,H,149.00,0`,
  ];
  const file = `\uFEFF${HEADER}\r\n${rows[0]}\n${rows[1]}\r\n${rows[2]}\n`;
  const answer = await staff.post("/api/v1/catalog/import", {
    multipart: { file: { name: "edited-by-hand.csv", mimeType: "text/csv", buffer: Buffer.from(file, "utf8") } },
  });
  expect(answer.status()).toBe(200);
  expect(await answer.json()).toEqual({ added: 3, updated: 0, unchanged: 0, refused: [], written: true });

  const exported = (await (await staff.get("/api/v1/catalog/export")).text()).split("\r\n").filter((line) => line.startsWith(prefix));
  expect(exported.map((line) => line.split(",")[0])).toEqual([`${prefix}-1`, `${prefix}-2`, `${prefix}-3`]);
  expect(exported.every((line) => !line.includes("\n") && !line.includes("\r"))).toBe(true);
  expect(exported[0]).toContain(",1204.50,");

  const anyone = await client(baseURL!);

  const template = await anyone.get("/downloads/sidewise-catalog-template.csv");
  const templateText = await template.text();
  expect(templateText.trimEnd().split("\r\n")).toHaveLength(2);
  const again = await staff.post("/api/v1/catalog/import", {
    multipart: { file: { name: "template.csv", mimeType: "text/csv", buffer: Buffer.from(templateText, "utf8") } },
  });
  expect(await again.json()).toEqual({ added: 0, updated: 0, unchanged: 0, refused: [], written: false });
});

test("no e-mail header carries a line break, even when a driver's text has several lines", async ({ baseURL }) => {
  const anyone = await client(baseURL!);
  const stamp = Date.now();
  const email = `lines.${stamp}@example.test`;
  const { renderedAt } = await (await anyone.get("/api/v1/quote-requests/form-token")).json();
  await expect.poll(() => Date.now() - Number(renderedAt.split(".")[0]), { message: "the form has been open 3 s" }).toBeGreaterThanOrEqual(3000);
  // The name and the vehicle are one line by their own rules (a 400 otherwise); the tires may take several.
  const sent = await anyone.post("/api/v1/quote-requests", {
    headers: { "x-forwarded-for": freshAddress() },
    data: {
      name: "Ines Marlow",
      email,
      vehicle: "2016 wagon with a roof box",
      tires: "225/65R17 102H\nor the 215/60R16\r\nwhichever is sooner",
      source: "finder",
      website: "",
      renderedAt,
    },
  });
  expect(sent.status(), await sent.text()).toBe(201);

  type Sent = { to: string | string[]; from: string; subject: string; reply_to?: string | string[] };
  const about = (message: Sent) => JSON.stringify(message).includes(email);
  const mine = async () => ((await (await fetch(inbox)).json()) as { data: Sent[] }).data.filter(about);
  await expect.poll(async () => (await mine()).length, { message: "the shop's copy and the driver's acknowledgement arrive" }).toBe(2);
  for (const message of await mine()) {
    for (const value of [message.subject, message.from, message.to, message.reply_to ?? []].flat()) {
      expect(value, `header of "${message.subject}"`).not.toMatch(CONTROL);
    }
  }
  expect((await mine()).map((message) => message.subject).find((subject) => subject.startsWith("Price request"))).toMatch(
    /^Price request #\d+: \d+ × 225\/65R17 102H or the 215\/60R16/,
  );
});
