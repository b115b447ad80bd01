/** The four roles. Kept here (pure) so client code can use them without the database. */
export const ROLE_NAMES = ["maker", "reviewer", "instructor", "admin"] as const;
export type RoleName = (typeof ROLE_NAMES)[number];

export const ROLE_LABELS: Record<RoleName, string> = {
  maker: "Maker",
  reviewer: "Reviewer",
  instructor: "Instructor",
  admin: "Admin",
};
