import type { Metadata } from "next";
import QRCode from "qrcode";
import { PrintButton } from "@/components/sizing/print-button";
import { RegenerateLink } from "@/components/status/regenerate-link";
import { orPageError, requireShopContext } from "@/lib/auth/current";
import { can } from "@/lib/auth/permissions";
import { appUrl } from "@/lib/app-url";
import { getPress } from "@/lib/data/presses";
import { getStatusToken } from "@/lib/data/status-page";
import { regenerateStatusLinkAction } from "./actions";

export const metadata: Metadata = { title: "Status card" };

/** A printable card for the press: its name, a QR code of the status-page link, and the link written out. */
export default async function StatusCardPage({ params }: { params: Promise<{ pressId: string }> }) {
  const { pressId } = await params;
  const { user } = await requireShopContext();
  const actor = { userId: user.id };
  const press = await orPageError(getPress(actor, pressId));
  const url = appUrl(`/status/${await getStatusToken(actor, pressId)}`);
  // SVG made on the server from our own link: no script, so the page's CSP holds.
  const svg = await QRCode.toString(url, { type: "svg", errorCorrectionLevel: "M", margin: 1, color: { dark: "#14212b", light: "#ffffff" } });
  return (
    <div className="mx-auto flex max-w-md flex-col gap-4">
      <div className="flex flex-col items-center gap-3 rounded-lg bg-white p-6 text-center ring-2 ring-ink print:ring-0" data-testid="status-card">
        <p className="text-xs font-semibold tracking-widest text-steel-600 uppercase">Before you use this press</p>
        <h1 className="text-2xl font-bold">{press.name}</h1>
        <div className="w-56" role="img" aria-label={`QR code of ${url}`} dangerouslySetInnerHTML={{ __html: svg }} />
        <p className="text-sm">Scan to see whether it is safe to use and free, to book it or to report a problem.</p>
        <p className="font-mono text-xs break-all" data-testid="status-link">
          {url}
        </p>
      </div>
      <div className="no-print flex flex-wrap gap-2">
        <PrintButton label="Print the card" />
        <a href={url} className="inline-flex min-h-11 items-center px-2 text-sm text-oil-700 underline">
          Open the status page
        </a>
      </div>
      {can(press.role, "regenerateStatusLink") ? <RegenerateLink action={regenerateStatusLinkAction.bind(null, pressId)} /> : null}
    </div>
  );
}
