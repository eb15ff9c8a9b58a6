import { Card } from "@/components/ui/card";
import { can, type Role } from "@/lib/auth/permissions";
import { countPressPhotos, listPressPhotos } from "@/lib/data/photos";
import { photoUrlTtlS } from "@/lib/photos/file-urls";
import { PressGallery } from "./press-gallery";
import type { PartOption } from "./photo-uploader";

type Props = { pressId: string; userId: string; role: Role; retired: boolean; parts: PartOption[] };

/** The press page's Photos card: the newest page comes with the page, then the gallery keeps it fresh and loads older ones. */
export async function PressPhotos({ pressId, userId, role, retired, parts }: Props) {
  const actor = { userId };
  const [page, counts] = await Promise.all([listPressPhotos(actor, pressId), countPressPhotos(actor, pressId)]);
  const canAttach = can(role, "attachPhoto") && !retired;
  return (
    <Card title="Photos">
      {retired ? <p className="mb-3 text-sm text-steel-600">This press is retired: its record is closed to new photos.</p> : null}
      <PressGallery
        pressId={pressId}
        initial={{ photos: page.photos.map((p) => ({ ...p, createdAt: p.createdAt.toISOString() })), nextCursor: page.nextCursor, counts }}
        currentUserId={userId}
        canManage={can(role, "editAnyPhoto")}
        canAttach={canAttach}
        parts={parts}
        refreshMs={(photoUrlTtlS() * 1000) / 2}
      />
    </Card>
  );
}
