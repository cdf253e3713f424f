// The main action of a module page and the quiz page's button, by the learner's state.
import { describe, expect, it } from "vitest";
import { missingLinks, moduleActions, quizStartLabel, type ModuleState } from "@/lib/learner-actions";

const lessons = [
  { slug: "a", title: "Lesson A" },
  { slug: "b", title: "Lesson B" },
];
const base: ModuleState = { slug: "m", lessons, done: new Set(), openAttempt: false, passed: false, completed: false, hasSkills: false, missing: [] };

describe("module page main action", () => {
  it("starts, then continues the lessons while some are open", () => {
    expect(moduleActions(base).main).toEqual({ label: "Start the lessons", href: "/modules/m/a" });
    expect(moduleActions({ ...base, done: new Set(["a"]) }).main).toEqual({ label: "Continue the lessons", href: "/modules/m/b" });
  });
  it("with all lessons done the quiz is the main action, not “Continue the lessons”", () => {
    const a = moduleActions({ ...base, done: new Set(["a", "b"]) });
    expect(a.main).toEqual({ label: "Start the quiz", href: "/modules/m/quiz" });
    expect(a.others.map((o) => o.label)).toContain("Review the lessons");
    expect([a.main, ...a.others].some((o) => o.label === "Continue the lessons")).toBe(false);
  });
  it("an open attempt resumes; a pass with sign-offs left leads to the sign-off page; completion to the certificate", () => {
    expect(moduleActions({ ...base, openAttempt: true }).main.label).toBe("Resume the quiz");
    expect(moduleActions({ ...base, done: new Set(["a", "b"]), passed: true, hasSkills: true }).main).toEqual({ label: "Practical sign-offs", href: "/modules/m/sign-offs" });
    expect(moduleActions({ ...base, done: new Set(["a", "b"]), passed: true, completed: true }).main.href).toBe("/certificates");
  });
});

describe("quiz page", () => {
  it("says resume when an attempt is open and not “Start” after passing", () => {
    expect(quizStartLabel({ openAttempt: true, passed: false, completed: false })).toBe("Resume the quiz");
    expect(quizStartLabel({ openAttempt: false, passed: true, completed: false })).toBe("Take the quiz again");
    expect(quizStartLabel({ openAttempt: false, passed: false, completed: false })).toBe("Start the quiz");
  });
  it("links every missing item to the page that finishes it", () => {
    expect(missingLinks("m", lessons, ["lesson: Lesson B", "sign-off: Makes a CPVC joint"])).toEqual([
      { text: "Lesson: Lesson B", href: "/modules/m/b" },
      { text: "Practical sign-off: Makes a CPVC joint", href: "/modules/m/sign-offs" },
    ]);
  });
});
