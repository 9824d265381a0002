import { Fragment, type CSSProperties } from "react";
import type { EmailBlock, EmailMessage } from "./email-message";

// Mail programs ignore style sheets and CSS variables: the theme's light colours, written inline.
const ink = "#1b2129";
const inkSoft = "#4a5361";
const rule = "#d8d3c4";
const accent = "#244a9a";
const accentSoft = "#dfe6f5";

const page: CSSProperties = { margin: 0, padding: "24px 12px", backgroundColor: "#f5f3ec", color: ink, fontFamily: "Helvetica, Arial, sans-serif", fontSize: "16px", lineHeight: 1.5 };
const sheet: CSSProperties = { maxWidth: "560px", margin: "0 auto", padding: "24px", backgroundColor: "#fbfaf6", border: `1px solid ${rule}` };
const styles = {
  eyebrow: { margin: "0 0 4px", color: inkSoft, fontSize: "14px", textTransform: "uppercase", letterSpacing: "0.08em" },
  title: { margin: "0 0 16px", fontSize: "24px" },
  heading: { margin: "24px 0 8px", fontSize: "18px" },
  paragraph: { margin: "0 0 16px" },
  button: { display: "inline-block", padding: "12px 20px", backgroundColor: accent, color: "#ffffff", fontWeight: "bold", textDecoration: "none", borderRadius: "4px" },
  address: { margin: "8px 0 16px", fontSize: "13px", color: inkSoft, wordBreak: "break-all" },
  list: { margin: "0 0 16px", paddingLeft: "20px" },
  note: { margin: "0 0 16px", padding: "12px 16px", backgroundColor: accentSoft, borderLeft: `4px solid ${accent}` },
  caution: { margin: "24px 0 0", padding: "12px 16px", backgroundColor: "#fbf0d9", color: "#7a4a00", fontSize: "14px" },
} satisfies Record<string, CSSProperties>;

/** Lines with a line break between them (mail programs keep <br> where they drop white-space rules). */
function withBreaks(lines: readonly string[]) {
  return lines.map((line, index) => (
    <Fragment key={index}>
      {index > 0 ? <br /> : null}
      {line}
    </Fragment>
  ));
}

function Block({ block }: { block: EmailBlock }) {
  switch (block.kind) {
    case "eyebrow":
      return <p style={styles.eyebrow}>{block.text}</p>;
    case "title":
      return <h1 style={styles.title}>{block.text}</h1>;
    case "heading":
      return <h2 style={styles.heading}>{block.text}</h2>;
    case "paragraph":
      return <p style={styles.paragraph}>{withBreaks(block.lines)}</p>;
    case "button":
      return (
        <>
          <p style={{ margin: 0 }}>
            <a href={block.href} style={styles.button}>
              {block.label}
            </a>
          </p>
          <p style={styles.address}>{block.href}</p>
        </>
      );
    case "list":
      return (
        <ul style={styles.list}>
          {block.items.map((item) => (
            <li key={item}>{item}</li>
          ))}
        </ul>
      );
    case "fields":
      return (
        <p style={styles.paragraph}>
          {block.rows.map(([label, value]) => (
            <span key={label}>
              <strong>{label}:</strong> {value}
              <br />
            </span>
          ))}
        </p>
      );
    case "note":
      return (
        <div style={styles.note}>
          <p style={{ margin: "0 0 4px", fontWeight: "bold" }}>{block.title}</p>
          <p style={{ margin: 0 }}>{withBreaks(block.text.split("\n"))}</p>
        </div>
      );
    case "caution":
      return <p style={styles.caution}>{block.text}</p>;
  }
}

/** Any e-mail as an HTML document: inline styles only, one block after the other. */
export function EmailDocument({ message }: { message: EmailMessage }) {
  return (
    <html lang="en">
      {/* eslint-disable-next-line @next/next/no-head-element -- a standalone e-mail document, never a page of the app */}
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <title>{message.subject}</title>
      </head>
      <body style={page}>
        <div style={sheet}>
          {message.blocks.map((block, index) => (
            <Block key={index} block={block} />
          ))}
        </div>
      </body>
    </html>
  );
}
