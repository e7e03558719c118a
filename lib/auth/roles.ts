export const ROLES = ["lead", "crew", "client"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  lead: "Project lead",
  crew: "Crew",
  client: "Client",
};

/** Where each role lands after signing in. */
export const ROLE_HOME: Record<Role, string> = {
  lead: "/board",
  crew: "/board",
  client: "/portal",
};
