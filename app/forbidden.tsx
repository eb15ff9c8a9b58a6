import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

export default function Forbidden() {
  return (
    <div className="mx-auto max-w-lg px-4 py-16 text-center">
      <p className="font-mono text-sm font-semibold text-oil-600">403</p>
      <h1 className="mt-2 text-2xl font-semibold">Not for your role</h1>
      <p className="mt-3 text-steel-600">
        Your role in this shop does not allow this page. A manager of the shop can change roles.
      </p>
      <Link href="/dashboard" className={`${buttonClass("secondary")} mt-6`}>
        Back to the dashboard
      </Link>
    </div>
  );
}
