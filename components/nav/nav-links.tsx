"use client";
import Link from "next/link";
import { usePathname } from "next/navigation";

export interface NavItem {
  href: string;
  label: string;
}

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  // The longest matching href wins, so "/my/practice" does not also light up "/my".
  const matches = items.filter((i) => pathname === i.href || pathname.startsWith(`${i.href}/`));
  const current = matches.sort((a, b) => b.href.length - a.href.length)[0]?.href;
  return (
    <nav aria-label="Main" className="-mx-1 flex flex-wrap gap-1">
      {items.map((item) => {
        const active = item.href === current;
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? "page" : undefined}
            className={`whitespace-nowrap rounded-full px-3.5 py-1.5 text-sm font-bold transition-colors ${
              active ? "bg-walnut text-paper" : "text-walnut hover:bg-rosin-soft/70"
            }`}
          >
            {item.label}
          </Link>
        );
      })}
    </nav>
  );
}
