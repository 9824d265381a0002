import type { CSSProperties, ReactNode } from "react";
import type { FitCardEmailContent } from "@/lib/email/fit-card-email-content";

// Mail programs ignore style sheets and CSS variables: the theme's light colours, written inline.
const ink = "#1b2129";
const inkSoft = "#4a5361";
const rule = "#d8d3c4";
const accent = "#244a9a";
const accentSoft = "#dfe6f5";
const cautionInk = "#7a4a00";
const cautionSoft = "#fbf0d9";

const page: CSSProperties = { margin: 0, padding: "24px 12px", backgroundColor: "#f5f3ec", color: ink, fontFamily: "Helvetica, Arial, sans-serif", fontSize: "16px", lineHeight: 1.5 };
const sheet: CSSProperties = { maxWidth: "560px", margin: "0 auto", padding: "24px", backgroundColor: "#fbfaf6", border: `1px solid ${rule}` };
const heading: CSSProperties = { margin: "24px 0 8px", fontSize: "18px" };
const mono: CSSProperties = { fontFamily: "Menlo, Consolas, monospace" };
const list: CSSProperties = { margin: 0, paddingLeft: "20px" };
const button: CSSProperties = { display: "inline-block", padding: "12px 20px", backgroundColor: accent, color: "#ffffff", fontWeight: "bold", textDecoration: "none", borderRadius: "4px" };

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <>
      <h2 style={heading}>{title}</h2>
      {children}
    </>
  );
}

/** The Fit card e-mail as HTML: inline styles only, the card's link first, then the key numbers. */
export function FitCardEmail({ content }: { content: FitCardEmailContent }) {
  return (
    <html lang="en">
      {/* eslint-disable-next-line @next/next/no-head-element -- a standalone e-mail document, never a page of the app */}
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>{content.subject}</title>
      </head>
      <body style={page}>
        <div style={sheet}>
          <p style={{ margin: "0 0 4px", color: inkSoft, fontSize: "14px", textTransform: "uppercase", letterSpacing: "0.08em" }}>Fit card</p>
          <h1 style={{ margin: "0 0 16px", fontSize: "24px" }}>Tires for {content.original}</h1>
          <p style={{ margin: "0 0 16px" }}>Here is the Fit card the shop saved for you. Open it to see the sizes drawn to scale:</p>
          <p style={{ margin: "0 0 8px" }}>
            <a href={content.link} style={button}>
              Open your Fit card
            </a>
          </p>
          <p style={{ margin: 0, fontSize: "13px", color: inkSoft, wordBreak: "break-all" }}>{content.link}</p>

          {content.message ? (
            <div style={{ marginTop: "24px", padding: "12px 16px", backgroundColor: accentSoft, borderLeft: `4px solid ${accent}` }}>
              <p style={{ margin: "0 0 4px", fontWeight: "bold" }}>A note from the shop</p>
              <p style={{ margin: 0, whiteSpace: "pre-line" }}>{content.message}</p>
            </div>
          ) : null}

          <Section title="The sizes">
            <ul style={list}>
              <li>
                The tire on the car: <span style={mono}>{content.original}</span>
              </li>
              {content.otherSizes.map((size) => (
                <li key={size.designation}>
                  Also compared: <span style={mono}>{size.designation}</span> ({size.diameterChange})
                </li>
              ))}
            </ul>
          </Section>

          {content.tires.length > 0 ? (
            <Section title="Tires picked for you">
              <ul style={list}>
                {content.tires.map((tire) => (
                  <li key={`${tire.name} ${tire.marking}`} style={{ marginBottom: "8px" }}>
                    <strong>{tire.name}</strong>, <span style={mono}>{tire.marking}</span>
                    <br />
                    {tire.price}
                  </li>
                ))}
              </ul>
            </Section>
          ) : null}

          {content.shop ? (
            <Section title={content.shop.name}>
              <p style={{ margin: 0 }}>
                {content.shop.address}
                <br />
                <a href={`tel:${content.shop.phone.replace(/[^\d+]/g, "")}`} style={{ color: accent }}>
                  {content.shop.phone}
                </a>{" "}
                ·{" "}
                <a href={`mailto:${content.shop.email}`} style={{ color: accent }}>
                  {content.shop.email}
                </a>
                <br />
                {content.shop.hours}
              </p>
            </Section>
          ) : null}

          <p style={{ margin: "24px 0 0", padding: "12px 16px", backgroundColor: cautionSoft, color: cautionInk, fontSize: "14px" }}>{content.caution}</p>
        </div>
      </body>
    </html>
  );
}
