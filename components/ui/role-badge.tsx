import { ROLE_LABELS, type Role } from "@/lib/auth/permissions";

const STYLES: Record<Role, string> = {
  manager: "bg-steel-800 text-white",
  inspector: "bg-oil-100 text-oil-700",
  member: "bg-steel-100 text-steel-700",
};

export function RoleBadge({ role }: { role: Role }) {
  return <span className={`rounded px-2 py-0.5 text-xs font-semibold ${STYLES[role]}`}>{ROLE_LABELS[role]}</span>;
}
