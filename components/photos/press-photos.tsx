import { Card } from "@/components/ui/card";
import { can, type Role } from "@/lib/auth/permissions";
import { listComponents } from "@/lib/data/components";
import { listPressPhotos } from "@/lib/data/photos";
import { photoUrlTtlS } from "@/lib/photos/file-urls";
import { PressGallery } from "./press-gallery";

type Props = { pressId: string; userId: string; role: Role; retired: boolean };

/** The press page's Photos card: the first list comes with the page, then the gallery keeps it fresh. */
export async function PressPhotos({ pressId, userId, role, retired }: Props) {
  const actor = { userId };
  const [photos, parts] = await Promise.all([listPressPhotos(actor, pressId), listComponents(actor, pressId)]);
  const canAttach = can(role, "attachPhoto") && !retired;
  return (
    <Card title="Photos">
      {retired ? <p className="mb-3 text-sm text-steel-600">This press is retired: its record is closed to new photos.</p> : null}
      <PressGallery
        pressId={pressId}
        initial={photos.map((p) => ({ ...p, createdAt: p.createdAt.toISOString() }))}
        currentUserId={userId}
        canManage={can(role, "editAnyPhoto")}
        canAttach={canAttach}
        parts={parts.map((c) => ({ id: c.id, label: c.label }))}
        refreshMs={(photoUrlTtlS() * 1000) / 2}
      />
    </Card>
  );
}
