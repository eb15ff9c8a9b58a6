"use client";

import { useSearchParams } from "next/navigation";
import { RedirectWhenSignedIn } from "@/components/shell/redirect-when-signed-in";
import { FormMessage } from "@/components/ui/form-message";
import { safeNextPath } from "@/lib/auth/safe-next";

/**
 * The sign-in page is prerendered, so what its link says (?next=, ?signed-up=, ?reset=) is read
 * here, in the browser; each piece sits in its own Suspense boundary. `next` is only carried when
 * it stays on this site, and the sign-in action checks it again before redirecting.
 */
function useNextPath(): string {
  return safeNextPath(useSearchParams().get("next"), "");
}

/** The hidden field that carries ?next= through the sign-in form. */
export function NextPathField() {
  const next = useNextPath();
  return next ? <input type="hidden" name="next" value={next} /> : null;
}

/** Notices from the page that sent the visitor here, and the way on for one already signed in. */
export function SignInNotices() {
  const params = useSearchParams();
  const next = useNextPath();
  return (
    <>
      <RedirectWhenSignedIn to={next || "/dashboard"} />
      {params.get("signed-up") ? (
        // The same words whether or not the address already had an account (no enumeration).
        <div className="mb-4">
          <FormMessage
            tone="success"
            message="Thank you. If this address is new to Presswright, your account is ready: sign in below with the password you just chose. If the address already has an account, we have sent its owner an e-mail instead."
          />
        </div>
      ) : null}
      {params.get("reset") ? (
        <div className="mb-4">
          <FormMessage tone="success" message="Password changed. Sign in with the new one." />
        </div>
      ) : null}
    </>
  );
}
