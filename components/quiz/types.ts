export type PublicQuestion = {
  position: number;
  id: string;
  type: "single" | "multiple" | "truefalse" | "numeric" | "parametric";
  prompt: string;
  options?: { id: string; text: string }[];
  unit?: string;
};
export type AnswerValue = string | string[] | boolean | number | null;
export type OpenAttempt = {
  id: string;
  module: string;
  status: "open";
  startedAt: string;
  deadlineAt: string | null;
  passMark: number;
  questions: PublicQuestion[];
  answers: Record<string, AnswerValue>;
};
export type Feedback = {
  position: number;
  id: string;
  prompt: string;
  yourAnswer: string;
  correct: boolean;
  /** null until the person passed or has no attempts left in the period */
  correctAnswer: string | null;
  explanation: string;
  lesson: { slug: string; title: string; href: string };
};
export type GradedAttempt = {
  id: string;
  module: string;
  status: "graded";
  score: number;
  passed: boolean;
  passMark: number;
  correctCount: number;
  total: number;
  lateGraded: boolean;
  submittedAt: string | null;
  answersRevealed: boolean;
  /** set when the grade is saved but recording the completion must be retried */
  completionPending?: string;
  feedback: Feedback[];
};
export type AttemptView = OpenAttempt | GradedAttempt;
