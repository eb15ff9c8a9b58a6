"use client";

import { useRouter } from "next/navigation";
import { startTransition } from "react";
import { buttonClass } from "@/components/ui/button";

/** Shown for any failure while rendering a page; never shows the error's details. */
export default function ErrorPage({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  const router = useRouter();
  // A server-side failure (e.g. the database was briefly down) needs a fresh server render, not just a client retry.
  const retry = () =>
    startTransition(() => {
      router.refresh();
      reset();
    });
  return (
    <div className="mx-auto max-w-lg px-4 py-16 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-3 text-steel-600">
        We could not load this page — the database may be briefly unavailable. Nothing you saved was lost.
      </p>
      <button type="button" onClick={retry} className={`${buttonClass("primary")} mt-6`}>
        Try again
      </button>
    </div>
  );
}
