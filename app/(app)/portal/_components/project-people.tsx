type Person = { id: string; name: string; email: string; phone: string | null };

/** The lead and crew on a project, with ways to reach them. */
export function ProjectPeople({ lead, crew }: { lead: Person | null; crew: Person[] }) {
  const people = [...(lead ? [{ ...lead, role: "Project lead" }] : []), ...crew.map((c) => ({ ...c, role: "Crew" }))];
  if (!people.length) return <p className="text-sm text-muted">Your project team will be listed here once they're assigned.</p>;
  return (
    <ul className="grid gap-2 sm:grid-cols-2">
      {people.map((p) => (
        <li key={p.id} className="rounded-lg border border-line bg-paper/60 px-3 py-2 text-sm">
          <p className="font-medium">
            {p.name} <span className="text-xs font-normal text-muted">· {p.role}</span>
          </p>
          <p>
            <a className="text-accent hover:underline" href={`mailto:${p.email}`}>
              {p.email}
            </a>
          </p>
          {p.phone && (
            <p>
              <a className="text-accent hover:underline" href={`tel:${p.phone.replace(/[^+0-9]/g, "")}`}>
                {p.phone}
              </a>
            </p>
          )}
        </li>
      ))}
    </ul>
  );
}
