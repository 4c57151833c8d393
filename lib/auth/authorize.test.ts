import { describe, expect, it } from "vitest";
import { actions, can, projectRoles, rolesThatCan, type Action, type ProjectRole } from "./policy";
import { AuthError, can as reexported } from "./authorize";

// The policy table, cell by cell, from product.md's "Who uses it" table. A change to who
// may do what must change this expectation on purpose.
const Y = true, n = false;
const expected: Record<Action, Record<ProjectRole, boolean>> = {
  //                    owner designer reviewer installer trainee
  "project.read":      { owner: Y, designer: Y, reviewer: Y, installer: Y, trainee: Y },
  "project.update":    { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "project.delete":    { owner: Y, designer: n, reviewer: n, installer: n, trainee: n },
  "members.manage":    { owner: Y, designer: n, reviewer: n, installer: n, trainee: n },
  "schematic.read":    { owner: Y, designer: Y, reviewer: Y, installer: Y, trainee: Y },
  "schematic.edit":    { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "schematic.size":    { owner: Y, designer: Y, reviewer: n, installer: n, trainee: Y },
  "variant.practice":  { owner: Y, designer: Y, reviewer: n, installer: n, trainee: Y },
  "variant.read-practice": { owner: Y, designer: n, reviewer: Y, installer: n, trainee: n },
  "variant.compare":   { owner: Y, designer: Y, reviewer: Y, installer: n, trainee: Y },
  "revision.save":     { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "revision.submit":   { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "revision.review":   { owner: Y, designer: n, reviewer: Y, installer: n, trainee: n },
  "revision.issue":    { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "comment.write":     { owner: Y, designer: Y, reviewer: Y, installer: n, trainee: n },
  "site.read":         { owner: Y, designer: Y, reviewer: Y, installer: Y, trainee: Y },
  "site.record":       { owner: Y, designer: n, reviewer: n, installer: Y, trainee: n },
  "rooms.edit":        { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
  "site.rules":        { owner: Y, designer: n, reviewer: n, installer: n, trainee: n },
  "handover.send":     { owner: Y, designer: Y, reviewer: n, installer: n, trainee: n },
};

describe("can(role, action)", () => {
  it("covers every action in the table", () => {
    expect(Object.keys(expected).sort()).toEqual([...actions].sort());
  });
  for (const action of actions) {
    for (const role of projectRoles) {
      it(`${role} ${expected[action][role] ? "may" : "may not"} ${action}`, () => {
        expect(can(role, action)).toBe(expected[action][role]);
      });
    }
  }
  it("the owner can do everything", () => {
    expect(actions.every((a) => can("owner", a))).toBe(true);
  });
  it("a trainee cannot change the team's work", () => {
    for (const a of ["schematic.edit", "revision.save", "revision.submit", "revision.issue", "members.manage"] as const) expect(can("trainee", a)).toBe(false);
  });
  it("unknown roles get nothing", () => {
    expect(can("visitor" as ProjectRole, "project.read")).toBe(false);
  });
  it("is the same function from authorize.ts", () => {
    expect(reexported).toBe(can);
  });
  it("lists the roles for messages", () => {
    expect(rolesThatCan("revision.review")).toEqual(["owner", "reviewer"]);
  });
  it("AuthError carries its status and message", () => {
    const e = new AuthError(403, "Only a project owner can delete the project.");
    expect(e.status).toBe(403);
    expect(e).toBeInstanceOf(Error);
  });
});
