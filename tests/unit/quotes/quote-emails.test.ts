import { describe, expect, it } from "vitest";
import { renderEmail } from "@/lib/email/render-email";
import { quoteReplyEmail, requestConfirmationEmail, requestToShopEmail } from "@/lib/quotes/quote-emails";
import { finderQuoteTires, fitCardQuoteTires } from "@/components/quotes/quote-tires";
import { describeTire, stayingTiresWords } from "@/lib/tire";

const request = {
  id: 42,
  name: "Rosa <Iverley>",
  email: "rosa@example.test",
  phone: null,
  vehicle: "2019 family SUV",
  tires: "235/65R17 104H",
  quantity: 4,
  preferredDay: "2026-12-10",
};
const shop = {
  name: "Marrowby Tire Works",
  streetAddress: "12 Quarry Lane",
  town: "Marrowby",
  region: "OR",
  postalCode: "97000",
  phone: "(555) 010-4477",
  email: "counter@marrowby-tire.test",
  openingHours: "Mon–Fri 8–6, Sat 9–1",
};

describe("quote e-mails", () => {
  it("give the shop every field the driver typed and a link to answer in the Counter", async () => {
    const email = await renderEmail(requestToShopEmail(request, "https://shop.test/counter/requests/42"));
    expect(email.subject).toBe("Price request #42: 4 × 235/65R17 104H");
    expect(email.text).toContain("Vehicle: 2019 family SUV");
    expect(email.text).toContain("Phone: not given");
    expect(email.text).toContain("Preferred day: 2026-12-10");
    expect(email.text).toContain("https://shop.test/counter/requests/42");
  });

  it("keep every header on one line, whatever the driver typed: a line break would start a new header (RFC 5322 §2.2)", async () => {
    const email = await renderEmail(requestToShopEmail({ ...request, tires: "235/65R17 104H\r\nBcc: everyone@example.test\tand 4 more" }, "https://shop.test/counter/requests/42"));
    expect(email.subject).toBe("Price request #42: 4 × 235/65R17 104H Bcc: everyone@example.test and 4 more");
    expect(email.subject).not.toMatch(/[\u0000-\u001f\u007f]/);
  });

  it("confirm to the driver that the shop has the request and how to reach it, with nothing the sender typed", async () => {
    const typed = { ...request, name: "Visit https://elsewhere.example now", vehicle: "Call 555-0199 <b>today</b>", tires: "Free prize: reply with your password" };
    const email = await renderEmail(requestConfirmationEmail(typed, shop));
    expect(email.text).toContain("Marrowby Tire Works has your request #42 for a price on 4 tires, fitted on 2026-12-10 if you book");
    expect(email.text).toContain("Phone (555) 010-4477 · counter@marrowby-tire.test");
    expect(email.text).toContain("If you did not ask for a price, ignore this e-mail");
    for (const part of [email.subject, email.text, email.html]) {
      expect(part).not.toMatch(/elsewhere|555-0199|today|prize|password/);
    }
  });

  it("carry a staff reply with its line breaks and the shop's contact, and nothing internal", async () => {
    const email = await renderEmail(quoteReplyEmail(request, { body: "Four in stock at $129 each.\nFitting on Thursday works.", authorName: "Ollie" }, shop));
    expect(email.subject).toBe("About your price request (#42)");
    expect(email.text).toContain("Four in stock at $129 each.\nFitting on Thursday works.");
    expect(email.html).toContain("Four in stock at $129 each.<br/>Fitting on Thursday works.");
    expect(email.text).toContain("Ollie, Marrowby Tire Works");
    expect(email.text).not.toMatch(/counter\/requests|source|status/i);
  });
});

describe("the tires a page fills in", () => {
  it("write the size with its service description as the sidewall shows it", () => {
    // Common practice on the sidewall: single/dual load index, then the speed symbol (ETRTO / TRA notation).
    expect(describeTire({ designation: "LT265/75R16", loadIndex: 123, loadIndexDual: 120, speedSymbol: "S", loadRange: "E" })).toBe("LT265/75R16 123/120S, load range E");
    expect(describeTire({ designation: "285/50R20", loadIndex: null, speedSymbol: null })).toBe("285/50R20");
  });

  it("send the finder's original and the picked tires, or a Fit card's tires or sizes", () => {
    const picked = [{ brand: "Harrowgate", line: "Trailmere AT", designation: "235/65R17", loadIndex: 108, speedSymbol: "T" }];
    expect(finderQuoteTires({ designation: "235/65R17", loadIndex: 104, speedSymbol: "H" }, picked)).toBe("Replacing 235/65R17 104H\nHarrowgate Trailmere AT 235/65R17 108T");
    expect(fitCardQuoteTires({ sizes: ["225/45R17", "225/40R18"], tires: [] }, null)).toBe("225/45R17, 225/40R18");
    expect(fitCardQuoteTires({ sizes: ["235/65R17"], tires: picked.map((tire) => ({ ...tire, wear: null })) }, null)).toBe("Harrowgate Trailmere AT 235/65R17 108T");
  });

  it("send the tires that stay on an all-wheel-drive vehicle and each picked tire's verdict beside them", () => {
    const picked = [{ brand: "Harrowgate", line: "Trailmere AT", designation: "235/65R17", loadIndex: 108, speedSymbol: "T" }];
    const staying = stayingTiresWords({ remaining32: [7, 7.5], limit32: 2 });
    const verdict = "Shave to 9/32 in before fitting: 11/32 in new";
    const expected = `Replacing 235/65R17 104H\nAll-wheel drive: 2 tires stay at 7/32 in, 7.5/32 in (limit 2/32 in)\nHarrowgate Trailmere AT 235/65R17 108T (${verdict})`;
    expect(finderQuoteTires({ designation: "235/65R17", loadIndex: 104, speedSymbol: "H" }, picked, { staying, verdictOf: () => verdict })).toBe(expected);
    const card = { sizes: ["235/65R17"], tires: picked.map((tire) => ({ ...tire, wear: { words: verdict } })) };
    expect(fitCardQuoteTires(card, staying)).toBe(expected.split("\n").slice(1).join("\n"));
  });
});
