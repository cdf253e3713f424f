// Queries in flight when MariaDB stops fail with errors other than a refused connection; they mean
// "database unavailable" (503), not a bug (500). Codes and numbers as the MariaDB server and client
// define them (MariaDB error reference: 1053 ER_SERVER_SHUTDOWN, 1927 ER_CONNECTION_KILLED;
// client errors 2006 CR_SERVER_GONE_ERROR, 2013 CR_SERVER_LOST).
import { describe, expect, it } from "vitest";
import { isDatabaseDown } from "@/lib/db-errors";

const mysqlError = (message: string, fields: Record<string, unknown>) => Object.assign(new Error(message), fields);
const wrapped = (cause: Error) => Object.assign(new Error("Failed query: select 1"), { cause });

describe("isDatabaseDown", () => {
  it("recognises queries cut off by a stopping server, also when wrapped by the query builder", () => {
    expect(isDatabaseDown(wrapped(mysqlError("Server shutdown in progress", { code: "ER_SERVER_SHUTDOWN", errno: 1053 })))).toBe(true);
    expect(isDatabaseDown(wrapped(mysqlError("Connection was killed", { errno: 1927 })))).toBe(true);
    expect(isDatabaseDown(mysqlError("Lost connection to server during query", { errno: 2013 }))).toBe(true);
    expect(isDatabaseDown(mysqlError("MySQL server has gone away", { errno: 2006 }))).toBe(true);
    expect(isDatabaseDown(wrapped(new Error("Can't add new command when connection is in closed state")))).toBe(true);
  });
  it("still treats real query errors as bugs", () => {
    expect(isDatabaseDown(wrapped(mysqlError("Duplicate entry 'x' for key 'PRIMARY'", { code: "ER_DUP_ENTRY", errno: 1062 })))).toBe(false);
    expect(isDatabaseDown(mysqlError("Unknown column 'nope'", { code: "ER_BAD_FIELD_ERROR", errno: 1054 }))).toBe(false);
    expect(isDatabaseDown(new TypeError("x is undefined"))).toBe(false);
  });
});
