import { z } from "zod";
import { LOCALES } from "./config";

/** The body of POST /api/account/language (also what the Account page's setting sends). */
export const languageChoice = z.object({ language: z.enum(LOCALES, { message: "Choose English or Español." }) });
