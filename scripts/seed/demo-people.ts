// The invented demo scenario: Sable River Rail, two car shops, a wheel shop and a teardown lab.
export const DEMO_PASSWORD = "tearline-demo";

export const DEMO_SITES = [
  {
    code: "MJC",
    name: "Marrow Junction car shop",
    kind: "car-shop",
    railway: "Sable River Rail",
    location: "Marrow Junction",
    removalCostUsd: 3850,
  },
  { code: "PYC", name: "Pellham Yard car shop", kind: "car-shop", railway: "Sable River Rail", location: "Pellham", removalCostUsd: 3850 },
  { code: "OSW", name: "Osier wheel shop", kind: "wheel-shop", railway: "Sable River Rail", location: "Osier", removalCostUsd: 4400 },
  { code: "CFL", name: "Corby Flats bearing lab", kind: "lab", railway: "Sable River Rail", location: "Corby Flats" },
] as const;

export const DEMO_USERS = [
  { name: "Dana Okafor", email: "inspector@sable-river.example", role: "inspector", site: "MJC" },
  { name: "Luis Ferreira", email: "inspector.pellham@sable-river.example", role: "inspector", site: "PYC" },
  { name: "Priya Raman", email: "analyst@sable-river.example", role: "analyst", site: "CFL" },
  { name: "Tomasz Wielgus", email: "engineer@sable-river.example", role: "engineer", site: "CFL" },
  { name: "Grace Whitcombe", email: "manager@sable-river.example", role: "manager", site: null },
  { name: "Sam Adeyemi", email: "admin@sable-river.example", role: "admin", site: null },
] as const;
