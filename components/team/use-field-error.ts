"use client";
import { useTranslations } from "next-intl";
import type { FieldValues, Resolver } from "react-hook-form";
import { FIELD_ERROR_KEYS } from "@/lib/team/browser";

/** A zod or server field message in the reader's language (unknown messages pass through as sent). */
export function useFieldError() {
  const t = useTranslations("fieldErrors");
  return (message: string | undefined | null): string | undefined => {
    if (!message) return undefined;
    const key = FIELD_ERROR_KEYS[message];
    return key ? t(key) : message;
  };
}

function translateTree(node: unknown, tr: (m: string) => string | undefined): void {
  if (!node || typeof node !== "object") return;
  const o = node as Record<string, unknown>;
  if (typeof o.message === "string") o.message = tr(o.message) ?? o.message;
  for (const [k, v] of Object.entries(o)) if (k !== "ref" && k !== "message" && v && typeof v === "object") translateTree(v, tr);
}

/** Wraps a form's resolver so the messages it returns (from the shared zod schemas) are in the reader's language. */
export function useTranslatedResolver<TIn extends FieldValues, TCtx, TOut>(resolver: Resolver<TIn, TCtx, TOut>): Resolver<TIn, TCtx, TOut> {
  const tr = useFieldError();
  return (async (values, ctx, options) => {
    const result = await resolver(values, ctx, options);
    translateTree(result.errors, tr);
    return result;
  }) as Resolver<TIn, TCtx, TOut>;
}
