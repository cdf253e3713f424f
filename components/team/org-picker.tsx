import { useTranslations } from "next-intl";

/** For admins: which organization the team pages show (a plain GET form, no script needed). */
export function OrgPicker({ orgs, current, allowAll = true, action }: { orgs: { id: string; name: string }[]; current: string | null; allowAll?: boolean; action: string }) {
  const t = useTranslations("team");
  return (
    <form method="get" action={action} className="mb-6 flex flex-wrap items-end gap-3 rounded border border-line bg-panel p-3" aria-label={t("orgPicker.label")}>
      <div className="flex min-w-0 max-w-full flex-col gap-1">
        <label htmlFor="org-picker" className="text-sm font-bold">
          {t("orgPicker.org")}
        </label>
        <select id="org-picker" name="org" defaultValue={current ?? ""} className="min-h-11 max-w-full rounded border border-ink/40 bg-panel px-2">
          {allowAll ? <option value="">{t("orgPicker.all")}</option> : <option value="">{t("orgPicker.choose")}</option>}
          {orgs.map((o) => (
            <option key={o.id} value={o.id}>
              {o.name}
            </option>
          ))}
        </select>
      </div>
      <button type="submit" className="min-h-11 rounded border border-ink/40 bg-paper px-4 font-bold">
        {t("orgPicker.show")}
      </button>
    </form>
  );
}
