"use client";
import { useTranslations } from "next-intl";
import { useFieldError, useTranslatedResolver } from "@/components/team/use-field-error";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { ErrorSummary } from "@/components/ui/error-summary";
import { FormError, FormNotice } from "@/components/ui/field";
import { LiveMessage } from "@/components/ui/live-message";
import { ACCEPT, MAX_FILES, MAX_UPLOAD_LABEL, checkChosenFiles, uploadFormInput, type UploadFormInput } from "@/lib/signoffs/browser";

type ServerAnswer = { status: number; body: { error?: string; fieldErrors?: Record<string, string[]> } };

/** XMLHttpRequest rather than fetch: it reports upload progress, which matters on a job-site phone. */
function send(form: FormData, onProgress: (pct: number) => void, offline: string): Promise<ServerAnswer> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/sign-offs");
    xhr.responseType = "text";
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(Math.round((100 * e.loaded) / e.total));
    xhr.onload = () => {
      let body: ServerAnswer["body"] = {};
      try {
        body = JSON.parse(xhr.responseText);
      } catch {
        /* not JSON */
      }
      resolve({ status: xhr.status, body });
    };
    xhr.onerror = () => resolve({ status: 0, body: { error: offline } });
    xhr.send(form);
  });
}

/** Upload progress in words; spoken in quarter steps so a screen reader is not flooded. */

/** The learner's evidence upload for one skill: files, a note, progress, and every error in words. */
export function UploadForm({ module, skill, skillTitle }: { module: string; skill: string; skillTitle: string }) {
  const t = useTranslations("signoffs");
  const tr = useFieldError();
  const progressText = (pct: number | null) => t("progress", { pct: pct ?? 0 });
  const router = useRouter();
  const id = useId();
  const [files, setFiles] = useState<File[]>([]);
  const [fileError, setFileError] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const { register, handleSubmit, formState, setError, control } = useForm<UploadFormInput>({ resolver: useTranslatedResolver(zodResolver(uploadFormInput)), defaultValues: { note: "" } });

  async function onSubmit(values: UploadFormInput) {
    setProblem(null);
    setDone(null);
    const local = checkChosenFiles(files);
    if (local) return setFileError(local);
    setFileError(null);
    const form = new FormData();
    form.set("module", module);
    form.set("skill", skill);
    form.set("note", values.note);
    for (const f of files) form.append("files", f, f.name);
    setProgress(0);
    const res = await send(form, setProgress, t("offline"));
    setProgress(null);
    if (res.status === 201) {
      setDone(t("sentForReview"));
      router.refresh();
      return;
    }
    const fe = res.body.fieldErrors ?? {};
    if (fe.files?.[0]) setFileError(fe.files[0]);
    if (fe.note?.[0]) setError("note", { message: tr(fe.note[0]) ?? fe.note[0] });
    if (!fe.files?.[0] && !fe.note?.[0]) setProblem(tr(res.body.error) ?? t("uploadFailed", { status: res.status }));
  }

  const noteError = formState.errors.note?.message;
  const busy = progress !== null;
  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-3" aria-label={t("sendLabel", { skill: skillTitle })}>
      <ErrorSummary control={control} extra={[fileError ? { field: `${id}-files`, message: fileError } : null]} />
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-files`} className="font-bold">
          {t("files")}
        </label>
        <p id={`${id}-files-hint`} className="text-sm text-muted">
          {t("filesHint", { max: MAX_FILES, size: MAX_UPLOAD_LABEL })}
        </p>
        <input
          id={`${id}-files`}
          type="file"
          multiple
          accept={ACCEPT}
          disabled={busy}
          aria-invalid={fileError ? true : undefined}
          aria-describedby={`${id}-files-hint${fileError ? ` ${id}-files-error` : ""}`}
          onChange={(e) => {
            const list = Array.from(e.target.files ?? []);
            setFiles(list);
            setFileError(list.length ? checkChosenFiles(list) : null);
          }}
          className={`min-h-11 rounded border bg-panel px-3 py-2 text-ink file:mr-3 file:rounded file:border file:border-ink/40 file:bg-paper file:px-3 file:py-1 file:font-bold ${fileError ? "border-caution" : "border-ink/40"}`}
        />
        {fileError ? (
          <p id={`${id}-files-error`} role="alert" className="text-sm font-bold text-caution">
            {fileError}
          </p>
        ) : null}
      </div>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-note`} className="font-bold">
          {t("note")}
        </label>
        <textarea
          id={`${id}-note`}
          rows={3}
          disabled={busy}
          aria-invalid={noteError ? true : undefined}
          aria-describedby={noteError ? `${id}-note-error` : undefined}
          placeholder={t("notePlaceholder")}
          className={`rounded border bg-panel px-3 py-2 ${noteError ? "border-caution" : "border-ink/40"}`}
          {...register("note")}
        />
        {noteError ? (
          <p id={`${id}-note-error`} role="alert" className="text-sm font-bold text-caution">
            {noteError}
          </p>
        ) : null}
      </div>
      <FormError message={problem} />
      <FormNotice message={done} />
      {busy ? (
        <div className="flex items-center gap-3">
          <progress max={100} value={progress} className="h-3 w-48" aria-label={t("progressLabel")} />
          <span className="font-mono text-sm">{progressText(progress)}</span>
        </div>
      ) : null}
      <LiveMessage message={busy ? progressText(Math.floor((progress ?? 0) / 25) * 25) : ""} delay={1000} testId="upload-announcement" />
      <div>
        <Button type="submit" disabled={busy}>
          {busy ? t("sending") : t("send")}
        </Button>
      </div>
    </form>
  );
}
