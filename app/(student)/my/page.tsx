import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listAssignmentsForStudent } from "@/db/queries/assignments";
import { requireStudent } from "@/lib/auth/session";

export const metadata: Metadata = { title: "My drill sheets" };

export default async function MyDrillSheets() {
  const ctx = await requireStudent();
  const sheets = await listAssignmentsForStudent(db, ctx.studioId, ctx.membershipId);
  return (
    <div>
      <PageHeader
        title="My drill sheets"
        lead={`Hello ${ctx.user.name.split(" ")[0]}. These are the drills your teacher at ${ctx.studioName} set for you.`}
      />
      {sheets.length === 0 ? (
        <EmptyState title="Nothing assigned yet">
          When your teacher gives you a drill sheet it appears here, with the tempo to aim for. Until then, keep playing your pieces slowly and evenly.
        </EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {sheets.map((a) => (
            <li key={a.id}>
              <Card>
                <h2 className="text-lg font-semibold">
                  <Link href={`/my/assignments/${a.id}`} className="underline decoration-rosin">{a.title}</Link>
                </h2>
                <p className="font-mono text-xs text-muted">{a.dueDate ? `due ${a.dueDate}` : "no due date"}</p>
                {a.note ? <p className="mt-2 text-sm">{a.note}</p> : null}
              </Card>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
