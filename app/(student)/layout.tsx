import { AppShell } from "@/components/nav/app-shell";
import { requireStudent } from "@/lib/auth/session";

export default async function StudentLayout({ children }: { children: React.ReactNode }) {
  const ctx = await requireStudent();
  return <AppShell ctx={ctx}>{children}</AppShell>;
}
