import { expect } from "vitest";
import { ApiClient } from "./http";
import { keptMailIds, linkIn, waitForMail } from "./mail";

/** What every sign-up answers, registered address or new (lib/auth/hooks.ts). */
export const SIGN_UP_ANSWER = {
  status: "check-your-mail",
  message: "Check your mail to finish signing up: we have sent a message to that address.",
};

export const uniqueEmail = (prefix = "new") => `${prefix}-${Date.now()}-${Math.floor(Math.random() * 1e6)}@trimrail.test`;

/** A sign-up request as the form sends it. */
export function requestSignUp(client: ApiClient, input: { name: string; email: string; password: string }): Promise<Response> {
  return client.request("POST", "/api/auth/sign-up/email", { ...input, callbackURL: "/setups" });
}

/**
 * Signs a new person up the way a person does: the sign-up, then the link in the captured
 * verification mail, which signs them in. Returns their signed-in client.
 */
export async function signUpAndVerify({
  baseURL,
  mailDir,
  name,
  email,
  password,
}: {
  baseURL: string;
  mailDir: string;
  name: string;
  email: string;
  password: string;
}): Promise<ApiClient> {
  const client = new ApiClient(baseURL);
  const before = await keptMailIds(mailDir);
  const response = await requestSignUp(client, { name, email, password });
  expect(response.status).toBe(200);
  expect(await response.json()).toEqual(SIGN_UP_ANSWER);
  const mail = await waitForMail({ dir: mailDir, to: email, subject: /Confirm your e-mail address/, except: before });
  const link = linkIn(mail.text, "/api/auth/verify-email");
  const verify = await client.get(link.pathname + link.search);
  expect(verify.status).toBe(302);
  expect(client.hasSession()).toBe(true);
  return client;
}
