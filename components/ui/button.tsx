import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "danger";
const styles: Record<Variant, string> = {
  primary: "bg-copper text-white hover:bg-[#7f410f] border-copper",
  secondary: "bg-panel text-ink hover:bg-paper border-ink/40",
  danger: "bg-caution text-white hover:bg-[#8f1c13] border-caution",
};

export function Button({ variant = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      {...props}
      className={`inline-flex min-h-11 items-center justify-center rounded border px-4 py-2 font-bold disabled:cursor-not-allowed disabled:opacity-60 ${styles[variant]} ${className}`}
    />
  );
}

export const buttonLinkClass = "inline-flex min-h-11 items-center justify-center rounded border border-copper bg-copper px-4 py-2 font-bold text-white no-underline hover:bg-[#7f410f]";
