import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listAssignmentsForStudio } from "@/db/queries/assignments";
import { listOpenInvitations } from "@/db/queries/invitations";
import { listStudents } from "@/db/queries/students";
import { requireTeacher } from "@/lib/auth/session";
import { InviteForm } from "./invite-form";
import type { StudentRow } from "./student-row";
import { StudentsList } from "./students-list";
import { StudentsPlainTable } from "./students-plain-table";

export const metadata: Metadata = { title: "Students" };
export const dynamic = "force-dynamic";

export default async function StudentsPage() {
  const ctx = await requireTeacher();
  const [students, assignments, invitations] = await Promise.all([
    listStudents(db, ctx.studioId),
    listAssignmentsForStudio(db, ctx.studioId),
    listOpenInvitations(db, ctx.studioId),
  ]);
  const rows: StudentRow[] = students.map((s) => ({
    ...s,
    assignments: assignments.filter((a) => a.studentMembershipId === s.membershipId).map((a) => ({ id: a.id, sheetTitle: a.sheetTitle, dueDate: a.dueDate })),
  }));
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Students" lead="Who is in your studio, how far each hand comfortably reaches, and what each is working on." />
      <Card>
        <h2 className="mb-3 text-lg">Invite a student</h2>
        <InviteForm />
        {invitations.length > 0 ? (
          <p className="mt-3 text-sm text-muted">Waiting for: {invitations.map((i) => i.email).join(", ")}</p>
        ) : null}
      </Card>
      {rows.length === 0 ? (
        <EmptyState title="No students yet">Invite a student by e-mail. They set their own password and see only the sheets you assign to them.</EmptyState>
      ) : (
        <StudentsList rows={rows}>
          <StudentsPlainTable rows={rows} />
        </StudentsList>
      )}
    </div>
  );
}
