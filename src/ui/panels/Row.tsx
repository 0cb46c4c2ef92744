/** One row of fields for an item in a list, grouped under a name a screen reader announces. */
import type { ReactNode } from 'react';

export function Row({ label, children }: { label: string; children: ReactNode }) {
  return (
    <fieldset className="row">
      <legend className="visually-hidden">{label}</legend>
      {children}
    </fieldset>
  );
}
