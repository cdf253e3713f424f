"use client";
import { useTranslations } from "next-intl";
import { useState } from "react";
import type { AnswerValue, PublicQuestion } from "./types";

/** One question with native, keyboard-operable inputs. */
export function QuestionField({ q, value, onChange }: { q: PublicQuestion; value: AnswerValue; onChange: (v: AnswerValue) => void }) {
  const t = useTranslations("quiz");
  const name = `q-${q.position}`;
  const [raw, setRaw] = useState(typeof value === "number" ? String(value) : "");
  const [numError, setNumError] = useState<string | null>(null);

  if (q.type === "single" || q.type === "multiple") {
    const multi = q.type === "multiple";
    const chosen = new Set(Array.isArray(value) ? value : typeof value === "string" ? [value] : []);
    return (
      <fieldset>
        <legend className="mb-3 text-lg font-bold">{q.prompt}</legend>
        <div className="flex flex-col gap-2">
          {q.options?.map((o) => (
            <label key={o.id} className="flex min-h-11 cursor-pointer items-start gap-3 rounded border border-line bg-paper p-3 has-[:checked]:border-water has-[:checked]:bg-water-light">
              <input
                type={multi ? "checkbox" : "radio"}
                name={name}
                value={o.id}
                checked={chosen.has(o.id)}
                onChange={(e) => {
                  if (!multi) return onChange(o.id);
                  const next = new Set(chosen);
                  if (e.target.checked) next.add(o.id);
                  else next.delete(o.id);
                  onChange([...next]);
                }}
                className="mt-1 h-5 w-5 accent-water"
              />
              <span>{o.text}</span>
            </label>
          ))}
        </div>
      </fieldset>
    );
  }
  if (q.type === "truefalse") {
    return (
      <fieldset>
        <legend className="mb-3 text-lg font-bold">{q.prompt}</legend>
        <div className="flex flex-wrap gap-2">
          {[true, false].map((b) => (
            <label key={String(b)} className="flex min-h-11 cursor-pointer items-center gap-3 rounded border border-line bg-paper px-4 py-2 has-[:checked]:border-water has-[:checked]:bg-water-light">
              <input type="radio" name={name} checked={value === b} onChange={() => onChange(b)} className="h-5 w-5 accent-water" />
              <span>{b ? t("true") : t("false")}</span>
            </label>
          ))}
        </div>
      </fieldset>
    );
  }
  const id = `${name}-input`;
  return (
    <div>
      <label htmlFor={id} className="mb-3 block text-lg font-bold">{q.prompt}</label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          inputMode="decimal"
          autoComplete="off"
          value={raw}
          aria-invalid={numError ? true : undefined}
          aria-describedby={numError ? `${id}-error` : undefined}
          onChange={(e) => {
            const text = e.target.value;
            setRaw(text);
            if (text.trim() === "") {
              setNumError(null);
              return onChange(null);
            }
            const n = Number(text.replace(",", "."));
            if (!Number.isFinite(n)) return setNumError(t("enterNumber"));
            setNumError(null);
            onChange(n);
          }}
          className="min-h-11 w-40 rounded border border-ink/40 bg-panel px-3 py-2 font-mono"
        />
        <span className="font-mono">{q.unit}</span>
      </div>
      {numError ? <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-bold text-caution">{numError}</p> : null}
    </div>
  );
}
