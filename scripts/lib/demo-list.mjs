// The demo sign-ins, read from db/demo.ts so that the list printed by npm start is the seeded one.
import { readFileSync } from "node:fs";
import path from "node:path";
import { root } from "./config.mjs";

const src = readFileSync(path.join(root, "db/demo.ts"), "utf8");
export const DEMO_PASSWORD = src.match(/DEMO_PASSWORD = "([^"]+)"/)[1];
export const DEMO_PEOPLE = [...src.matchAll(/\{ name: "([^"]+)", email: "([^"]+)", role: "([a-z]+)"/g)].map(([, name, email, role]) => ({ name, email, role }));
