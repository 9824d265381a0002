import type { ReactNode } from "react";

export function PageIntro({ eyebrow, title, children }: { eyebrow?: string; title: string; children?: ReactNode }) {
  return (
    <div className="mb-8 max-w-3xl">
      {eyebrow ? <p className="font-mono text-xs tracking-widest text-accent uppercase">{eyebrow}</p> : null}
      <h1 className="mt-1 text-3xl font-semibold tracking-tight text-balance sm:text-4xl">{title}</h1>
      {children ? <div className="mt-3 text-lg text-ink-soft">{children}</div> : null}
    </div>
  );
}
