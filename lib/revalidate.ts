import { revalidatePath } from "next/cache";

/**
 * Drops the cached render of every signed-in page (the (app) layout and all below it). Never
 * revalidate the root path or its layout: that also re-renders the prerendered public pages at run time,
 * and the new HTML's inline scripts no longer match the hashes in their CSP (proxy.ts).
 */
export function revalidateSignedInPages(): void {
  revalidatePath("/(app)", "layout");
}
