// The role → action policy table from product.md ("Who uses it"). Pure data and one
// function, safe to import from client components to hide what a role cannot do.
// Server-side enforcement goes through lib/auth/authorize.ts, which uses this table.

export const projectRoles = ["owner", "designer", "reviewer", "installer", "trainee"] as const;
export type ProjectRole = (typeof projectRoles)[number];

export const actions = [
  "project.read", "project.update", "project.delete", "members.manage",
  "schematic.read", "schematic.edit", "schematic.size", "variant.practice", "variant.read-practice", "variant.compare",
  "revision.save", "revision.submit", "revision.review", "revision.issue",
  "comment.write", "site.read", "site.record", "rooms.edit", "site.rules", "handover.send",
] as const;
export type Action = (typeof actions)[number];

const R = true;
// owner: everything. designer: schematics, variants, sizing, submit and issue, rooms (heat losses).
// Rooms are read by every member (project.read).
// reviewer: read everything, comment, approve/send back. installer: issued revision and
// site sheet. trainee: read, private practice variants, size them, compare any two.
// Practice variants are private: read by the trainee who made them and by those who
// read others' (variant.read-practice: the project's owners and reviewers).
const table: Record<ProjectRole, Partial<Record<Action, true>>> = {
  owner: Object.fromEntries(actions.map((a) => [a, R])),
  designer: {
    "project.read": R, "project.update": R, "schematic.read": R, "schematic.edit": R, "schematic.size": R,
    "variant.practice": R, "variant.compare": R, "revision.save": R, "revision.submit": R, "revision.issue": R,
    "comment.write": R, "site.read": R, "rooms.edit": R, "handover.send": R,
  },
  reviewer: {
    "project.read": R, "schematic.read": R, "variant.read-practice": R, "variant.compare": R, "revision.review": R, "comment.write": R, "site.read": R,
  },
  installer: { "project.read": R, "schematic.read": R, "site.read": R, "site.record": R },
  trainee: { "project.read": R, "schematic.read": R, "schematic.size": R, "variant.practice": R, "variant.compare": R, "site.read": R },
};

export function can(role: ProjectRole, action: Action): boolean {
  return table[role]?.[action] === true;
}

export function isProjectRole(value: unknown): value is ProjectRole {
  return typeof value === "string" && (projectRoles as readonly string[]).includes(value);
}

/** Words for messages: "project.delete" → "delete the project". */
export const actionWords: Record<Action, string> = {
  "project.read": "open this project", "project.update": "change the project's details", "project.delete": "delete the project",
  "members.manage": "manage members and invitations", "schematic.read": "read this schematic", "schematic.edit": "edit the team's schematics",
  "schematic.size": "run sizing", "variant.practice": "make practice variants", "variant.read-practice": "read trainees' practice variants", "variant.compare": "compare variants",
  "revision.save": "save revisions", "revision.submit": "submit a revision for review", "revision.review": "approve or send back a revision",
  "revision.issue": "issue an approved revision", "comment.write": "write comments", "site.read": "read the site sheet",
  "site.record": "record site work", "rooms.edit": "change the rooms or the firm's emitter list",
  "site.rules": "set the firm's site rules (pressure-test drop and hold time)",
  "handover.send": "send the handover report to the client",
};

/** Roles that may do an action, for "needs owner or designer" messages. */
export function rolesThatCan(action: Action): ProjectRole[] {
  return projectRoles.filter((r) => can(r, action));
}
