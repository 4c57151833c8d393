import { expect } from "vitest";
import * as auth from "@/components/auth/actions";
import { callAction, cookieFromSetCookies, form } from "./call";
import { linkIn, mailTo } from "./mail";

export const randomIp = () => `10.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}.${Math.floor(Math.random() * 250)}`;

/** Sign-up in its two steps (the form, then the e-mailed link's button); the new person's session cookie. */
export async function signUpAndConfirm(o: { name: string; email: string; password: string; firm: string }): Promise<string> {
  const asked = await callAction(() => auth.signUpAction(null, form(o)), null, randomIp());
  expect(asked.status, JSON.stringify(asked.body)).toBe(200);
  const mail = await mailTo(o.email, { subject: "Finish creating your Loopwright account" });
  const token = linkIn(mail.text, "/sign-up");
  const done = await callAction(() => auth.confirmSignUpAction(null, form({ token })), null);
  expect(done.status, JSON.stringify(done.body)).toBe(303);
  return cookieFromSetCookies(done.setCookies)!;
}
