import { AppShell } from "@/components/nav/app-shell";
import { requireTeacher } from "@/lib/auth/session";

export default async function TeacherLayout({ children }: { children: React.ReactNode }) {
  const ctx = await requireTeacher();
  return <AppShell ctx={ctx}>{children}</AppShell>;
}
