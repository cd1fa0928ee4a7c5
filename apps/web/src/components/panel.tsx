import type { ReactNode } from 'react';

type PanelProps = {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Heading level inside the page; pages have one h1, so sections default to h2. */
  headingLevel?: 'h2' | 'h3';
  /** No inner padding: for a table that should run to the panel's edges. */
  flush?: boolean;
};

/** A titled white section of a page. */
export function Panel({ title, description, children, headingLevel: Heading = 'h2', flush = false }: PanelProps) {
  return (
    <section className="rounded-lg border border-slate-200 bg-white" aria-label={title}>
      <div className="border-b border-slate-200 px-5 py-3">
        <Heading className="text-base font-semibold text-slate-900">{title}</Heading>
        {description ? <p className="mt-0.5 text-sm text-slate-600">{description}</p> : null}
      </div>
      <div className={flush ? undefined : 'p-5'}>{children}</div>
    </section>
  );
}
