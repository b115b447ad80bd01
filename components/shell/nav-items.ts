import type { RoleName } from "@/lib/auth/roles";

export type NavItem = { href: string; label: string; roles?: readonly RoleName[]; signedIn?: boolean };

/** The screens of PRODUCT.md, in the order a maker meets them. */
export const NAV_ITEMS: readonly NavItem[] = [
  { href: "/check", label: "Quick check" },
  { href: "/parts", label: "Parts bin", signedIn: true },
  { href: "/builds", label: "Builds", signedIn: true },
  { href: "/compare", label: "Side by side", signedIn: true },
  { href: "/bench", label: "Bench runs", signedIn: true },
  { href: "/reviews", label: "Review desk", roles: ["reviewer", "admin"] },
  { href: "/classes", label: "Classroom", signedIn: true },
  { href: "/admin", label: "Admin", roles: ["admin"] },
];

export function navFor(role: RoleName | null): NavItem[] {
  return NAV_ITEMS.filter((item) => {
    if (item.roles) return role !== null && item.roles.includes(role);
    if (item.signedIn) return role !== null;
    return true;
  });
}
