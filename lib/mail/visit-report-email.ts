import { composeEmail, type Email } from "./layout";

export type VisitReportFacts = {
  companyName: string;
  recipientName: string;
  projectTitle: string;
  /** The visit's date as the client reads it, e.g. "Tuesday 2 March 2027". */
  visitDate: string;
  byName: string;
  tasksDone: string[];
  tasksNotDone: string[];
  waterChangeL: number | null;
  waterTest: string | null;
  equipment: string[];
  livestockNote: string | null;
  clientNotes: string | null;
  url: string;
};

/**
 * The signed-off visit report as plain sentences. Only what the client may read goes in: the
 * caller never passes internal notes.
 */
export function visitReportEmail(f: VisitReportFacts): Email {
  const paragraphs = [`${f.byName} visited ${f.projectTitle} on ${f.visitDate}. Here is what was done.`];
  if (f.tasksDone.length) paragraphs.push(`Done: ${f.tasksDone.join("; ")}.`);
  if (f.tasksNotDone.length) paragraphs.push(`Not done this time: ${f.tasksNotDone.join("; ")}.`);
  if (f.waterChangeL != null) paragraphs.push(`Water changed: ${f.waterChangeL} L.`);
  if (f.waterTest) paragraphs.push(`Water test: ${f.waterTest}.`);
  if (f.equipment.length) paragraphs.push(`Equipment serviced: ${f.equipment.join("; ")}.`);
  if (f.livestockNote) paragraphs.push(`Fish and livestock: ${f.livestockNote}`);
  if (f.clientNotes) paragraphs.push(`Notes: ${f.clientNotes}`);
  return composeEmail({
    companyName: f.companyName,
    subject: `${f.projectTitle}: visit report for ${f.visitDate}`,
    greetingName: f.recipientName,
    paragraphs,
    link: { label: "See the report and photos", url: f.url },
  });
}

/** A water test in one line, in stored units (mg/L, °C, ppt). */
export function waterTestLine(t: { ammoniaMgL: number | null; nitriteMgL: number | null; nitrateMgL: number | null; pH: number | null; tempC: number | null; khDkh: number | null; salinityPpt: number | null }): string | null {
  const parts: string[] = [];
  if (t.ammoniaMgL != null) parts.push(`ammonia ${t.ammoniaMgL} mg/L`);
  if (t.nitriteMgL != null) parts.push(`nitrite ${t.nitriteMgL} mg/L`);
  if (t.nitrateMgL != null) parts.push(`nitrate ${t.nitrateMgL} mg/L`);
  if (t.pH != null) parts.push(`pH ${t.pH}`);
  if (t.tempC != null) parts.push(`${t.tempC} °C`);
  if (t.khDkh != null) parts.push(`KH ${t.khDkh} dKH`);
  if (t.salinityPpt != null) parts.push(`salinity ${t.salinityPpt} ppt`);
  return parts.length ? parts.join(", ") : null;
}
