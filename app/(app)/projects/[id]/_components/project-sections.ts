import type { Role } from "@/lib/auth/roles";
import type { ProjectTab } from "./project-tabs";

/** The project's sections, each a page under /projects/[id]/…, and who sees each. */
const SECTIONS: { path: string; label: string; roles: Role[] }[] = [
  { path: "", label: "Overview", roles: ["lead", "crew", "client"] },
  { path: "/survey", label: "Site & load", roles: ["lead", "crew"] },
  { path: "/install", label: "Install day", roles: ["lead", "crew"] },
  { path: "/water", label: "Water & cycling", roles: ["lead", "crew", "client"] },
  { path: "/fish", label: "Fish", roles: ["lead", "crew", "client"] },
  { path: "/photos", label: "Photos", roles: ["lead", "crew", "client"] },
  { path: "/talk", label: "Messages & notes", roles: ["lead", "crew", "client"] },
  { path: "/visits", label: "Visits", roles: ["lead", "crew"] },
  { path: "/equipment", label: "Equipment", roles: ["lead", "crew", "client"] },
  { path: "/money", label: "Money", roles: ["lead", "client"] },
];

export function projectTabsFor(projectId: string, role: Role): ProjectTab[] {
  return SECTIONS.filter((s) => s.roles.includes(role)).map((s) => ({ href: `/projects/${projectId}${s.path}`, label: s.label }));
}
