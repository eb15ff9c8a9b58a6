import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { FreshSWR } from "@/components/ui/fresh-swr";
import { applyStartingPlanAction, addServiceTaskAction, updateServiceTaskAction } from "@/app/(app)/presses/[pressId]/service/actions";
import { can, type Role } from "@/lib/auth/permissions";
import { listServiceEntries } from "@/lib/data/service-log";
import { getServicePlan } from "@/lib/data/service-plan";
import type { UnitSystem } from "@/lib/units";
import { ServiceLogTable } from "./service-log-table";
import { ServicePlan } from "./service-plan";

type Props = { pressId: string; userId: string; role: Role; retired: boolean; units: UnitSystem; currency: string };

const PAGE_SIZE = 25;

/** The press page's service section: the plan with what is due, then the log (first page with the page, the rest on demand). */
export async function PressService({ pressId, userId, role, retired, units, currency }: Props) {
  const actor = { userId };
  const [plan, firstPage] = await Promise.all([getServicePlan(actor, pressId), listServiceEntries(actor, pressId, { limit: PAGE_SIZE })]);
  const canLog = can(role, "logService") && !retired;
  return (
    <div className="flex flex-col gap-4 [&>*]:min-w-0">
      <Card title="Service plan">
        <ServicePlan
          tasks={plan.tasks}
          timeZone={plan.timeZone}
          canEdit={can(role, "editServicePlan") && !retired}
          actions={{
            startingPlan: applyStartingPlanAction.bind(null, pressId),
            addTask: addServiceTaskAction.bind(null, pressId),
            editTask: (taskId: string) => updateServiceTaskAction.bind(null, pressId, taskId),
          }}
        />
      </Card>
      <div>
        <Card
          title="Service log"
          actions={
            canLog ? (
              <Link href={`/presses/${pressId}/service/new`} className={buttonClass("primary")}>
                Log service
              </Link>
            ) : null
          }
        >
          <FreshSWR>
            <ServiceLogTable
              pressId={pressId}
              initial={{ entries: firstPage.entries.map(({ createdAt: _omit, ...e }) => e), nextCursor: firstPage.nextCursor }}
              units={units}
              currency={currency}
              pageSize={PAGE_SIZE}
            />
          </FreshSWR>
        </Card>
      </div>
    </div>
  );
}
