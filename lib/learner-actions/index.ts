/**
 * Which button leads on a module page and on its quiz page, and where each "still to do" line
 * links. Pure (no server code), so the rules are unit-tested without a browser.
 */
export type Action = { label: string; href: string };

export type ModuleState = {
  slug: string;
  lessons: { slug: string; title: string }[];
  done: ReadonlySet<string>;
  /** an attempt is open (started, not submitted): the quiz resumes it */
  openAttempt: boolean;
  /** the last graded attempt passed */
  passed: boolean;
  completed: boolean;
  /** the module has practical sign-offs */
  hasSkills: boolean;
  /** what completion still needs, as lib/completion's missingForCompletion lists it */
  missing: string[];
};

/** The labels' English text; pages pass their catalog's version (messages/<locale>/modules.json "actions"). */
export const ACTION_LABELS = {
  resumeQuiz: "Resume the quiz",
  retakeQuiz: "Take the quiz again",
  startQuiz: "Start the quiz",
  continueLessons: "Continue the lessons",
  startLessons: "Start the lessons",
  reviewLessons: "Review the lessons",
  signOffs: "Practical sign-offs",
  certificate: "See your certificate",
  missingLesson: "Lesson: {title}",
  missingSignOff: "Practical sign-off: {title}",
} as const;
export type ActionLabel = (key: keyof typeof ACTION_LABELS, values?: { title: string }) => string;
const english: ActionLabel = (key, values) => ACTION_LABELS[key].replace("{title}", values?.title ?? "");

const quizHref = (slug: string) => `/modules/${slug}/quiz`;
const signOffsHref = (slug: string) => `/modules/${slug}/sign-offs`;

/** The quiz page's start button: resume an open attempt, retake after a pass, or start. */
export function quizStartLabel(s: { openAttempt: boolean; passed: boolean; completed: boolean }, label: ActionLabel = english): string {
  if (s.openAttempt) return label("resumeQuiz");
  if (s.passed || s.completed) return label("retakeQuiz");
  return label("startQuiz");
}

/** The main action of a module page and the secondary ones, in order. */
export function moduleActions(s: ModuleState, label: ActionLabel = english): { main: Action; others: Action[] } {
  const firstOpen = s.lessons.find((l) => !s.done.has(l.slug));
  const allDone = !firstOpen;
  const lessonsAction: Action = firstOpen
    ? { label: label(s.done.size ? "continueLessons" : "startLessons"), href: `/modules/${s.slug}/${firstOpen.slug}` }
    : { label: label("reviewLessons"), href: `/modules/${s.slug}/${s.lessons[0]?.slug ?? ""}` };
  const quizAction: Action = { label: quizStartLabel(s, label), href: quizHref(s.slug) };
  const signOffs: Action[] = s.hasSkills ? [{ label: label("signOffs"), href: signOffsHref(s.slug) }] : [];
  if (s.completed) return { main: { label: label("certificate"), href: "/certificates" }, others: [lessonsAction, quizAction, ...signOffs] };
  // Passed with sign-offs still to approve: the sign-off page is what is left.
  if (allDone && s.passed && s.hasSkills) return { main: signOffs[0]!, others: [lessonsAction, quizAction] };
  // An open attempt, or every lesson done: the quiz leads.
  if (s.openAttempt || allDone) return { main: quizAction, others: [lessonsAction, ...signOffs] };
  return { main: lessonsAction, others: [quizAction, ...signOffs] };
}

/** "lesson: Title" / "sign-off: Title" lines → text with the page that finishes each. */
export function missingLinks(slug: string, lessons: { slug: string; title: string }[], missing: string[], label: ActionLabel = english): { text: string; href: string | null }[] {
  return missing.map((m) => {
    if (m.startsWith("lesson: ")) {
      const title = m.slice("lesson: ".length);
      const l = lessons.find((x) => x.title === title);
      return { text: label("missingLesson", { title }), href: l ? `/modules/${slug}/${l.slug}` : null };
    }
    if (m.startsWith("sign-off: ")) return { text: label("missingSignOff", { title: m.slice("sign-off: ".length) }), href: signOffsHref(slug) };
    return { text: m, href: null };
  });
}
