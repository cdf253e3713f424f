"use client";
import { useMemo } from "react";
import { NextIntlClientProvider, useLocale, useMessages, useTimeZone, type AbstractIntlMessages } from "next-intl";
import { FORMATS } from "@/lib/i18n/browser";

/** A nested provider holding the messages around it plus `messages` (components/i18n/scoped-messages.tsx). */
export function MergeMessages({ messages, children }: { messages: AbstractIntlMessages; children: React.ReactNode }) {
  const outer = useMessages();
  const locale = useLocale();
  const timeZone = useTimeZone();
  const merged = useMemo(() => ({ ...outer, ...messages }), [outer, messages]);
  return (
    <NextIntlClientProvider locale={locale} timeZone={timeZone} formats={FORMATS} messages={merged}>
      {children}
    </NextIntlClientProvider>
  );
}
