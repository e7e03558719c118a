"use client";
import { useState } from "react";
import { WATER_KINDS, WATER_LABELS } from "@/lib/stocking/species";
import { buttonStyles } from "@/components/ui/button-styles";
import { SpeciesForm, type SpeciesFormRow } from "./species-form";

/** The catalogue by water kind, with one form for a new species or the one being edited. */
export function SpeciesCatalogue({ species }: { species: SpeciesFormRow[] }) {
  const [editing, setEditing] = useState<SpeciesFormRow | null>(null);
  return (
    <div className="flex flex-col gap-6">
      <SpeciesForm key={editing?.id ?? "new"} editing={editing} onDone={() => setEditing(null)} />
      {WATER_KINDS.map((w) => (
        <section key={w} aria-labelledby={`sp-${w}`} className="rounded-2xl border border-line bg-card p-5">
          <h2 id={`sp-${w}`} className="mb-2 text-lg font-semibold first-letter:uppercase">
            {WATER_LABELS[w]}
          </h2>
          <table className="w-full text-sm">
            <thead className="text-left text-muted">
              <tr>
                <th className="py-1">Species</th>
                <th className="py-1">°C</th>
                <th className="py-1">pH</th>
                <th className="py-1">Adult</th>
                <th className="py-1">Temperament</th>
                <th className="py-1">Group</th>
                <th className="py-1">Source</th>
                <th className="py-1">
                  <span className="sr-only">Edit</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {species
                .filter((s) => s.water === w)
                .map((s) => (
                  <tr key={s.id} className="border-t border-line align-top">
                    <td className="py-1">
                      {s.commonName} <i className="text-muted">{s.scientificName}</i>
                      {s.notes && <p className="text-xs text-muted">{s.notes}</p>}
                    </td>
                    <td className="num py-1">
                      {s.tempMinC}–{s.tempMaxC}
                    </td>
                    <td className="num py-1">
                      {s.phMin.toFixed(1)}–{s.phMax.toFixed(1)}
                    </td>
                    <td className="num py-1">{s.adultLengthMm / 10} cm</td>
                    <td className="py-1">
                      {s.temperament}
                      {s.territorial ? ", territorial" : ""}
                    </td>
                    <td className="num py-1">{s.shoalMin > 1 ? `${s.shoalMin}+` : "—"}</td>
                    <td className="py-1 text-xs">{s.source}</td>
                    <td className="py-1">
                      <button type="button" className={buttonStyles.quiet} onClick={() => setEditing(s)} aria-label={`Edit ${s.commonName}`}>
                        Edit
                      </button>
                    </td>
                  </tr>
                ))}
            </tbody>
          </table>
        </section>
      ))}
    </div>
  );
}
