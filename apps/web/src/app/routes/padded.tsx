import type { ReactNode } from 'react';

/** States shown inside a flush panel still need the panel's padding. */
export function Padded({ children }: { children: ReactNode }) {
  return <div className="p-5">{children}</div>;
}
