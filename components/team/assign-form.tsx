"use client";
import Link from "next/link";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useTranslations } from "next-intl";
import { useEffect, useId, useState } from "react";
import { Controller, useForm, useWatch } from "react-hook-form";
import useSWR from "swr";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { Field, FormError, FormNotice } from "@/components/ui/field";
import { useDebounced } from "@/components/ui/use-debounced";
import { getJson, postJson } from "@/lib/fetcher";
import { assignSchema, type AssignInput } from "@/lib/team/browser";
import { isoDay } from "@/lib/dates";
import { useFieldError, useTranslatedResolver } from "./use-field-error";

type Out = z.output<typeof assignSchema>;
type PersonHit = { id: string; name: string; email: string; team: string | null };
type Item = { slug: string; title: string };

const today = () => isoDay(new Date());

/** Assign a module or a learning path to people and/or whole teams, with a due date. */
export function AssignForm({ modules, paths, teams, org }: { modules: Item[]; paths: Item[]; teams: { id: string; name: string }[]; org: string | null }) {
  const t = useTranslations("team");
  const tr = useFieldError();
  const router = useRouter();
  const ids = { kind: useId(), item: useId(), search: useId(), teams: useId() };
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [search, setSearch] = useState("");
  const [chosen, setChosen] = useState<PersonHit[]>([]);
  const { register, handleSubmit, setValue, control, formState, setError: setFieldError, clearErrors } = useForm<AssignInput, unknown, Out>({
    resolver: useTranslatedResolver(zodResolver(assignSchema)),
    defaultValues: { kind: "path", slug: paths[0]?.slug ?? "", userIds: [], teamIds: [], dueAt: "", org: org ?? undefined },
  });
  const kind = useWatch({ control, name: "kind" });
  const items = kind === "module" ? modules : paths;
  useEffect(() => {
    setValue("slug", (kind === "module" ? modules : paths)[0]?.slug ?? "");
  }, [kind, modules, paths, setValue]);
  const q = useDebounced(search.trim(), 250);
  const people = useSWR<{ people: PersonHit[] }>(q ? `/api/team/people?q=${encodeURIComponent(q)}${org ? `&org=${encodeURIComponent(org)}` : ""}` : null, getJson);

  function choose(p: PersonHit) {
    if (chosen.some((c) => c.id === p.id)) return;
    const next = [...chosen, p];
    setChosen(next);
    setValue("userIds", next.map((c) => c.id));
    clearErrors("targets" as never);
  }
  function drop(id: string) {
    const next = chosen.filter((c) => c.id !== id);
    setChosen(next);
    setValue("userIds", next.map((c) => c.id));
  }

  async function onSubmit(values: Out) {
    setError(null);
    setDone(null);
    const res = await postJson<{ message: string }>("/api/team/assignments", { ...values, org: org ?? undefined });
    if (!res.ok) {
      for (const [field, messages] of Object.entries(res.fieldErrors ?? {})) setFieldError(field as keyof AssignInput, { message: tr(messages[0]) });
      setError(tr(res.error) ?? res.error);
      return;
    }
    setDone(res.data.message);
    setChosen([]);
    setValue("userIds", []);
    setValue("teamIds", []);
    router.refresh();
  }

  const targetsError = (formState.errors as Record<string, { message?: string } | undefined>).targets?.message;

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex max-w-2xl flex-col gap-5" aria-label={t("nav.assign")}>
      <ErrorSummary control={control} />
      <FormError message={error} />
      <FormNotice message={done} />
      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">{t("assign.what")}</legend>
        <div className="flex gap-4">
          <label className="flex items-center gap-2">
            <input type="radio" value="path" {...register("kind")} className="h-5 w-5" /> {t("assign.path")}
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" value="module" {...register("kind")} className="h-5 w-5" /> {t("board.module")}
          </label>
        </div>
        <label htmlFor={ids.item} className="sr-only">{kind === "module" ? t("board.module") : t("assign.path")}</label>
        <select id={ids.item} {...register("slug")} className="min-h-11 rounded border border-ink/40 bg-panel px-2">
          {items.map((i) => (
            <option key={i.slug} value={i.slug}>{i.title}</option>
          ))}
        </select>
        {formState.errors.slug ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.slug.message}</p> : null}
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">{t("assign.teams")}</legend>
        <p className="text-sm text-muted">{t("assign.teamsNote")}</p>
        <Controller
          control={control}
          name="teamIds"
          render={({ field }) => (
            <div className="flex flex-wrap gap-x-6 gap-y-2">
              {teams.length === 0 ? (
                <span className="text-muted">
                  {t.rich("assign.noTeams", { link: (c) => <Link href={`/team/teams${org ? `?org=${org}` : ""}`}>{c}</Link> })}
                </span>
              ) : null}
              {teams.map((x) => (
                <label key={x.id} className="flex min-h-11 items-center gap-2">
                  <input
                    type="checkbox"
                    className="h-5 w-5"
                    checked={(field.value ?? []).includes(x.id)}
                    onChange={(e) => field.onChange(e.target.checked ? [...(field.value ?? []), x.id] : (field.value ?? []).filter((y) => y !== x.id))}
                  />
                  {x.name}
                </label>
              ))}
            </div>
          )}
        />
        {formState.errors.teamIds ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.teamIds.message}</p> : null}
      </fieldset>

      <fieldset className="flex flex-col gap-2">
        <legend className="font-bold">{t("assign.people")}</legend>
        <label htmlFor={ids.search} className="text-sm">{t("assign.find")}</label>
        <input id={ids.search} type="search" value={search} onChange={(e) => setSearch(e.target.value)} className="min-h-11 rounded border border-ink/40 bg-panel px-3" autoComplete="off" />
        {q ? (
          people.error ? (
            <p className="text-sm text-caution">{t("assign.searchFailed", { message: (people.error as Error).message })}</p>
          ) : !people.data ? (
            <p className="text-sm" role="status">{t("assign.searching")}</p>
          ) : people.data.people.length === 0 ? (
            <p className="text-sm">{t("assign.noMatch", { q })}</p>
          ) : (
            <ul className="flex flex-col gap-1" aria-label={t("assign.matching")}>
              {people.data.people.map((p) => (
                <li key={p.id}>
                  <button type="button" onClick={() => choose(p)} disabled={chosen.some((c) => c.id === p.id)} className="min-h-11 w-full rounded border border-line bg-panel px-3 text-left disabled:opacity-50">
                    {p.name} <span className="text-sm text-muted">{p.email} · {p.team ?? t("noTeam")}</span>
                  </button>
                </li>
              ))}
            </ul>
          )
        ) : null}
        {chosen.length ? (
          <ul className="flex flex-wrap gap-2" aria-label={t("assign.chosen")}>
            {chosen.map((c) => (
              <li key={c.id} className="flex items-center gap-2 rounded border border-ink/40 bg-panel px-2 py-1">
                {c.name}
                <button type="button" onClick={() => drop(c.id)} className="min-h-8 rounded px-2 font-bold" aria-label={t("assign.removePerson", { name: c.name })}>
                  ×
                </button>
              </li>
            ))}
          </ul>
        ) : null}
        {formState.errors.userIds ? <p role="alert" className="text-sm font-bold text-caution">{formState.errors.userIds.message}</p> : null}
      </fieldset>
      {targetsError ? (
        <p role="alert" className="text-sm font-bold text-caution">
          {targetsError}
        </p>
      ) : null}

      <Field label={t("assign.due")} type="date" min={today()} {...register("dueAt")} error={formState.errors.dueAt?.message} hint={t("assign.dueHint")} />
      <Button type="submit" disabled={formState.isSubmitting} className="self-start">
        {formState.isSubmitting ? t("assign.assigning") : t("assign.assign")}
      </Button>
    </form>
  );
}
