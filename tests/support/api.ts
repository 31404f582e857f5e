// An HTTP client for API tests: signs in as a demo person and keeps the session cookie.
import { DEMO_PASSWORD, DEMO_USERS } from "../../scripts/seed/demo-people";
import { APP_URL } from "./env";

export type DemoRole = (typeof DEMO_USERS)[number]["role"];

export class ApiClient {
  cookie = "";
  constructor(
    public label = "anonymous",
    public base = APP_URL,
  ) {}

  async request(method: string, path: string, body?: unknown, headers: Record<string, string> = {}): Promise<Response> {
    const isForm = typeof FormData !== "undefined" && body instanceof FormData;
    const res = await fetch(`${this.base}${path}`, {
      method,
      redirect: "manual",
      headers: {
        origin: this.base,
        ...(this.cookie ? { cookie: this.cookie } : {}),
        ...(body !== undefined && !isForm ? { "content-type": "application/json" } : {}),
        ...headers,
      },
      body: body === undefined ? undefined : isForm ? (body as FormData) : typeof body === "string" ? body : JSON.stringify(body),
    });
    const set = res.headers.getSetCookie?.() ?? [];
    if (set.length) {
      const jar = new Map(
        this.cookie
          .split("; ")
          .filter(Boolean)
          .map((c) => [c.split("=")[0], c] as const),
      );
      for (const c of set) {
        const pair = c.split(";")[0];
        jar.set(pair.split("=")[0], pair);
      }
      this.cookie = [...jar.values()].join("; ");
    }
    return res;
  }

  get = (path: string) => this.request("GET", path);
  post = (path: string, body?: unknown) => this.request("POST", path, body);
  patch = (path: string, body?: unknown) => this.request("PATCH", path, body);
  put = (path: string, body?: unknown) => this.request("PUT", path, body);
  del = (path: string) => this.request("DELETE", path);

  async json<T = Record<string, unknown>>(method: string, path: string, body?: unknown): Promise<{ status: number; body: T }> {
    const res = await this.request(method, path, body);
    const text = await res.text();
    let parsed: unknown = text;
    try {
      parsed = JSON.parse(text);
    } catch {
      /* not JSON: keep text */
    }
    return { status: res.status, body: parsed as T };
  }

  async signIn(email: string, password: string) {
    const res = await this.post("/api/auth/sign-in/email", { email, password });
    if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${await res.text()}`);
    return this;
  }
}

export function demoUser(role: DemoRole) {
  return DEMO_USERS.find((u) => u.role === role)!;
}

const cache = new Map<string, ApiClient>();
/** A signed-in client for a demo role (cached per test file). */
export async function as(role: DemoRole | "inspector.pellham"): Promise<ApiClient> {
  const hit = cache.get(role);
  if (hit) return hit;
  const u = role === "inspector.pellham" ? DEMO_USERS[1] : demoUser(role);
  const client = await new ApiClient(role).signIn(u.email, DEMO_PASSWORD);
  cache.set(role, client);
  return client;
}

export const ALL_ROLES: DemoRole[] = ["inspector", "analyst", "engineer", "manager", "admin"];
