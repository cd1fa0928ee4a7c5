import { useState, type ReactNode } from 'react';
import { Button } from './button';

type DisclosureFormProps = {
  /** The button that opens the form, e.g. "New borehole". */
  openLabel: string;
  /** The form; it is given `close` to call after a successful save or on Cancel. */
  children: (close: () => void) => ReactNode;
  size?: 'sm' | 'md';
};

/** A create form kept out of the way until asked for; the form should autofocus its first field. */
export function DisclosureForm({ openLabel, children, size = 'sm' }: DisclosureFormProps) {
  const [open, setOpen] = useState(false);
  if (!open) {
    return (
      <Button variant="secondary" size={size} onClick={() => setOpen(true)} aria-expanded="false">
        {openLabel}
      </Button>
    );
  }
  return <div className="rounded-md border border-slate-200 bg-slate-50 p-4">{children(() => setOpen(false))}</div>;
}
