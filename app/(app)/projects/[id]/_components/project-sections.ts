import type { Role } from "@/lib/auth/roles";
import type { Stage } from "@/lib/stages/stages";
import type { ProjectTab } from "./project-tabs";

/** The project's sections, each a page under /projects/[id]/…, and who sees each. */
const SECTIONS: { path: string; label: string; roles: Role[]; stages?: Stage[] }[] = [
  { path: "", label: "Overview", roles: ["lead", "crew", "client"] },
  { path: "/survey", label: "Site & load", roles: ["lead", "crew"] },
  { path: "/install", label: "Install day", roles: ["lead", "crew"] },
  { path: "/water", label: "Water & cycling", roles: ["lead", "crew", "client"] },
  { path: "/fish", label: "Fish", roles: ["lead", "crew", "client"] },
  { path: "/photos", label: "Photos", roles: ["lead", "crew", "client"] },
  { path: "/talk", label: "Messages & notes", roles: ["lead", "crew", "client"] },
  { path: "/visits", label: "Visits", roles: ["lead", "crew"] },
  { path: "/equipment", label: "Equipment", roles: ["lead", "crew", "client"] },
  { path: "/service", label: "Service", roles: ["lead", "crew", "client"], stages: ["first_stocking", "in_service"] },
  { path: "/money", label: "Money", roles: ["lead", "client"] },
];

/** `stage` hides sections that belong to a later part of the tank's life (the Service tab before stocking). */
export function projectTabsFor(projectId: string, role: Role, stage?: Stage): ProjectTab[] {
  return SECTIONS.filter((s) => s.roles.includes(role) && (!stage || !s.stages || s.stages.includes(stage))).map((s) => ({ href: `/projects/${projectId}${s.path}`, label: s.label }));
}
