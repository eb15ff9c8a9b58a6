import { SERVICE_KINDS } from "@/db/schema/service";
import { SERVICE_KIND_LABELS } from "@/lib/service/starting-plan";

export const SERVICE_KIND_OPTIONS = SERVICE_KINDS.map((k) => ({ value: k, label: SERVICE_KIND_LABELS[k] }));
