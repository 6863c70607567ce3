// A tiny HTTP client for the app under test that keeps one session cookie, like a browser.
import { TEST_ENV } from "../test-env";

// The app the e2e setup serves: PORT when the environment sets it (each checkout's own), else the test port.
export const BASE_URL = process.env.FOLDWRIGHT_TEST_URL ?? `http://127.0.0.1:${process.env.PORT || TEST_ENV.PORT}`;
export const DEMO_PASSWORD = process.env.DEMO_PASSWORD || "foldwright-demo";

export class Client {
  cookie = "";

  async request(method: string, path: string, body?: unknown): Promise<Response> {
    // A browser names its page's origin on every write (the CSRF check in lib/csrf.ts needs it).
    const headers: Record<string, string> = { origin: BASE_URL };
    if (this.cookie) headers.cookie = this.cookie;
    let payload: BodyInit | undefined;
    if (body instanceof FormData) payload = body;
    else if (body !== undefined) {
      headers["content-type"] = "application/json";
      payload = JSON.stringify(body);
    }
    const res = await fetch(`${BASE_URL}${path}`, { method, headers, body: payload, redirect: "manual" });
    const set = res.headers.getSetCookie().find((c) => c.startsWith("foldwright_session="));
    if (set) this.cookie = set.split(";")[0].endsWith("=") ? "" : set.split(";")[0];
    return res;
  }

  static async signedIn(email: string, password = DEMO_PASSWORD): Promise<Client> {
    const client = new Client();
    const res = await client.request("POST", "/api/auth/sign-in", { email, password });
    if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${await res.text()}`);
    return client;
  }
}
