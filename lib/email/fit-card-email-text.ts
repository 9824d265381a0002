import type { FitCardEmailContent } from "./fit-card-email-content";

/** The plain-text twin of the Fit card e-mail, for mail programs that show no HTML. */
export function fitCardEmailText(content: FitCardEmailContent): string {
  const lines: string[] = ["Hello,", "", "Here is the Fit card the shop saved for you. Open it to see the sizes drawn to scale:", content.link, ""];
  if (content.message) lines.push("A note from the shop:", content.message, "");
  lines.push(`The tire on the car: ${content.original}`);
  for (const size of content.otherSizes) lines.push(`Also compared: ${size.designation} (${size.diameterChange})`);
  lines.push("");
  if (content.tires.length > 0) {
    lines.push("Tires picked for you:");
    for (const tire of content.tires) lines.push(`- ${tire.name}, ${tire.marking}: ${tire.price}`);
    lines.push("");
  }
  if (content.shop) lines.push(content.shop.name, content.shop.address, `${content.shop.phone} · ${content.shop.email}`, content.shop.hours, "");
  lines.push(content.caution);
  return lines.join("\n");
}
