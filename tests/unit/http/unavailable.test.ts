// Which errors mean "a backing service is out of reach" (503) and which are bugs (500).
// The codes are PostgreSQL's SQLSTATEs (PostgreSQL manual, appendix A) and Node's socket errors.
import { describe, expect, it } from "vitest";
import { isObjectStoreOutage, ObjectStoreUnavailable, unavailableService } from "@/lib/http/unavailable";

const withCode = (code: string, message = "x") => Object.assign(new Error(message), { code });

describe("unavailableService", () => {
  it("names the database for connection failures, shutdown and statement timeouts", () => {
    expect(unavailableService(withCode("ECONNREFUSED"))).toBe("database");
    expect(unavailableService(new AggregateError([withCode("ECONNREFUSED")]))).toBe("database");
    expect(unavailableService(withCode("57P01", "terminating connection due to administrator command"))).toBe("database");
    expect(unavailableService(withCode("57P03", "the database system is starting up"))).toBe("database");
    expect(unavailableService(withCode("08006"))).toBe("database");
    expect(unavailableService(withCode("57014", "canceling statement due to statement timeout"))).toBe("database");
    expect(unavailableService(new Error("timeout exceeded when trying to connect"))).toBe("database");
    expect(unavailableService(new Error("Connection terminated unexpectedly"))).toBe("database");
    // Drizzle wraps the driver's error in its own.
    expect(unavailableService(new Error("Failed query: select 1", { cause: withCode("ECONNREFUSED") }))).toBe("database");
  });

  it("names the object store for a marked store call", () => {
    expect(unavailableService(new ObjectStoreUnavailable(withCode("ECONNREFUSED")))).toBe("object-store");
  });

  it("leaves ordinary errors and refusals alone", () => {
    expect(unavailableService(new Error("boom"))).toBeNull();
    expect(unavailableService(withCode("23505", "duplicate key"))).toBeNull();
    expect(unavailableService(withCode("42P01", "relation does not exist"))).toBeNull();
    expect(unavailableService(null)).toBeNull();
  });
});

describe("isObjectStoreOutage", () => {
  it("is true for refused sockets, timeouts and 503 answers, false for a refusal by the store", () => {
    expect(isObjectStoreOutage(withCode("ECONNREFUSED"))).toBe(true);
    expect(isObjectStoreOutage(Object.assign(new Error("t"), { name: "TimeoutError" }))).toBe(true);
    expect(isObjectStoreOutage(Object.assign(new Error("s"), { name: "ServiceUnavailable", $metadata: { httpStatusCode: 503 } }))).toBe(
      true,
    );
    expect(isObjectStoreOutage(Object.assign(new Error("n"), { name: "NoSuchKey", $metadata: { httpStatusCode: 404 } }))).toBe(false);
    expect(isObjectStoreOutage(Object.assign(new Error("a"), { name: "AccessDenied", $metadata: { httpStatusCode: 403 } }))).toBe(false);
  });
});
