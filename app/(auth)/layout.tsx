import Link from "next/link";
import { Wordmark } from "@/components/logo-mark";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col items-center px-4 py-10">
      <Link href="/" aria-label="Knotwork, back to the start page" className="mb-8">
        <Wordmark />
      </Link>
      <main className="w-full max-w-md rounded-[var(--radius-card)] border border-line bg-card p-6 shadow-[0_8px_30px_rgba(91,58,41,0.08)] sm:p-8">
        {children}
      </main>
      <footer className="mt-6 text-xs text-muted">
        <Link href="/about" className="underline">About and credits</Link>
      </footer>
    </div>
  );
}
