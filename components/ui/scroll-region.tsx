import type { ReactNode } from "react";

/**
 * A box that scrolls sideways when its content (a wide table) is wider than a phone. It takes focus
 * so keyboard users can scroll it with the arrow keys, and is a named region so a screen reader
 * says what that tab stop is.
 */
export function ScrollRegion({ label, className = "", children }: { label: string; className?: string; children: ReactNode }) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`relative overflow-x-auto ${className}`}>
      {children}
    </div>
  );
}
