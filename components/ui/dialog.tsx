"use client";

import { useEffect, useRef, type ReactNode } from "react";

/**
 * A modal on the native <dialog>: the browser traps focus, closes it on Escape and restores focus
 * afterwards. A click on the backdrop closes it too.
 */
export function Dialog({ open, onClose, label, children }: { open: boolean; onClose: () => void; label: string; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-label={label}
      onClose={onClose}
      onClick={(e) => {
        if (e.target === e.currentTarget) onClose();
      }}
      className="m-auto max-h-[calc(100dvh-1rem)] w-[calc(100%-1rem)] max-w-4xl overflow-y-auto rounded-lg bg-white p-0 text-ink shadow-xl backdrop:bg-ink/70"
    >
      {open ? children : null}
    </dialog>
  );
}
