import { createElement } from "react";
import { EmailDocument } from "./email-document";
import { headerText, type EmailMessage, type RenderedEmail } from "./email-message";
import { emailText } from "./email-text";

/**
 * An e-mail's blocks as its subject, text and HTML. react-dom/server is loaded when first needed
 * rather than imported at the top, because route handlers are bundled for React Server Components,
 * where a static import of it is refused.
 */
export async function renderEmail(message: EmailMessage): Promise<RenderedEmail> {
  const { renderToStaticMarkup } = await import("react-dom/server");
  return {
    subject: headerText(message.subject),
    text: emailText(message),
    html: `<!DOCTYPE html>${renderToStaticMarkup(createElement(EmailDocument, { message }))}`,
  };
}
