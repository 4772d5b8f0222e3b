import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listStudents } from "@/db/queries/students";
import { requireTeacher } from "@/lib/session";

export const metadata: Metadata = { title: "Students" };

export default async function StudentsPage() {
  const ctx = await requireTeacher();
  const students = await listStudents(db, ctx.studioId);
  return (
    <div>
      <PageHeader title="Students" lead="Who is in your studio, and how far each hand comfortably reaches." />
      {students.length === 0 ? (
        <EmptyState title="No students yet">Invite a student by e-mail. They set their own password and see only the sheets you assign to them.</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {students.map((s) => (
            <li key={s.membershipId}>
              <Card>
                <h2 className="text-lg font-semibold">{s.name}</h2>
                <p className="text-sm text-muted">{s.email}</p>
                <p className="mt-3 font-mono text-xs text-muted">
                  {s.spanMm ? `1–5 span ${s.spanMm} mm · octave ${s.octaveMm} mm` : "No hand profile yet"}
                </p>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
