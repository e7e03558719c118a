/** The invented demo company and its people. Every name here is made up. */
export const DEMO_PASSWORD = "demo-tank-2026";

export const DEMO_COMPANY = { name: "Saltmarsh & Stone Aquariums", email: "office@saltmarsh-stone.test", phone: "+44 20 7946 0321" };

export const DEMO_PEOPLE = [
  { key: "lead", name: "Maren Okafor", email: "maren@saltmarsh-stone.test", role: "lead", phone: "+44 20 7946 0322" },
  { key: "crew1", name: "Teodor Lind", email: "teo@saltmarsh-stone.test", role: "crew", phone: "+44 7700 900411" },
  { key: "crew2", name: "Priya Castell", email: "priya@saltmarsh-stone.test", role: "crew", phone: "+44 7700 900412" },
  { key: "hollis", name: "Hollis Brandt", email: "hollis@client.test", role: "client", phone: "+44 7700 900501" },
  { key: "amara", name: "Amara Quist", email: "amara@client.test", role: "client", phone: "+44 7700 900502" },
  { key: "wen", name: "Wen Aldous", email: "wen@client.test", role: "client", phone: "+44 7700 900503" },
  { key: "odile", name: "Odile Marchetti", email: "odile@client.test", role: "client", phone: "+44 7700 900504" },
  { key: "rafe", name: "Rafe Ashdown (Orrowfen Dental Rooms)", email: "rafe@client.test", role: "client", phone: "+44 7700 900505" },
] as const;

export type DemoPersonKey = (typeof DEMO_PEOPLE)[number]["key"];
