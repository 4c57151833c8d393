// The invented demo firm and one person per project role. Printed by `npm start`;
// the passwords are for local demos only.
export const demoFirm = { id: "6a0f3c1e-0000-4000-8000-000000000001", name: "Fernbank Heating Co-op", slug: "fernbank" };

export const demoUsers = [
  { id: "demo-owner", email: "owner@fernbank.example", name: "Rowan Hale", role: "owner", password: "copper-loop-owner" },
  { id: "demo-designer", email: "designer@fernbank.example", name: "Imogen Pryce", role: "designer", password: "copper-loop-designer" },
  { id: "demo-reviewer", email: "reviewer@fernbank.example", name: "Tobias Venn", role: "reviewer", password: "copper-loop-reviewer" },
  { id: "demo-installer", email: "installer@fernbank.example", name: "Callum Ash", role: "installer", password: "copper-loop-installer" },
  { id: "demo-trainee", email: "trainee@fernbank.example", name: "Nia Thorne", role: "trainee", password: "copper-loop-trainee" },
] as const;

export type DemoRole = (typeof demoUsers)[number]["role"];
