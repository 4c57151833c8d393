import { demoUsers } from "../db/seeds/demo/people";

// Printed by `npm start` so a person can sign in straight away.
const url = process.env.APP_URL ?? "http://localhost:3000";
console.log(`\nLoopwright is starting on ${url}${process.env.MAIL_VIEWER === "true" ? `  (caught e-mail: ${url}/dev/mail)` : ""}`);
console.log("Demo sign-ins (firm: Fernbank Heating Co-op):");
for (const u of demoUsers) console.log(`  ${u.role.padEnd(10)} ${u.email.padEnd(28)} ${u.password}`);
console.log("");
