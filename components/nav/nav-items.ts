import type { Role } from "@/db/schema";
import type { NavItem } from "./nav-links";

/** Navigation by role. Every href here has its own page that checks the role again. */
export const NAV_BY_ROLE: Record<Role, NavItem[]> = {
  teacher: [
    { href: "/home", label: "Home" },
    { href: "/pieces", label: "Pieces" },
    { href: "/knots", label: "Knots" },
    { href: "/sheets", label: "Drill sheets" },
    { href: "/students", label: "Students" },
    { href: "/assignments", label: "Assignments" },
    { href: "/progress", label: "Progress" },
  ],
  student: [
    { href: "/my", label: "My drill sheets" },
    { href: "/my/practice", label: "Practice log" },
  ],
};
