import type { ButtonHTMLAttributes } from "react";

const VARIANTS = {
  primary: "bg-oil-500 text-ink hover:bg-oil-400 disabled:bg-steel-200",
  secondary: "bg-white text-ink ring-1 ring-steel-300 hover:bg-steel-100",
  danger: "bg-fail text-white hover:opacity-90",
  quiet: "text-steel-700 hover:bg-steel-100",
} as const;

export type ButtonVariant = keyof typeof VARIANTS;

export function buttonClass(variant: ButtonVariant = "primary", extra = ""): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 text-sm font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${extra}`;
}

export function Button({
  variant = "primary",
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: ButtonVariant }) {
  return <button {...props} className={buttonClass(variant, className)} />;
}
