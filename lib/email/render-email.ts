import type { ReactElement } from "react";

/**
 * An e-mail's React tree as an HTML document. react-dom/server is loaded when first needed rather
 * than imported at the top, because route handlers are bundled for React Server Components, where
 * a static import of it is refused. React escapes every text it renders.
 */
export async function renderEmailHtml(email: ReactElement): Promise<string> {
  const { renderToStaticMarkup } = await import("react-dom/server");
  return `<!DOCTYPE html>${renderToStaticMarkup(email)}`;
}
