import type { ButtonHTMLAttributes, ReactNode } from "react";
import { Link, type LinkProps } from "react-router-dom";
import { Spinner } from "./spinner";

type Variant = "primary" | "secondary" | "ghost" | "danger";

const base =
  "inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 text-[15px] font-medium leading-none transition-colors select-none disabled:cursor-not-allowed disabled:opacity-60";

const variants: Record<Variant, string> = {
  primary: "bg-brand text-white hover:bg-brand-strong",
  secondary: "border border-rule bg-panel text-ink hover:border-muted",
  ghost: "text-ink hover:bg-ink/5",
  danger: "border border-danger/40 bg-panel text-danger hover:bg-danger/5",
};

export function buttonClasses(variant: Variant = "primary", extra = ""): string {
  return `${base} ${variants[variant]} ${extra}`.trim();
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  /** Shows a spinner and blocks a second submit while a request runs. */
  pending?: boolean;
  icon?: ReactNode;
}

export function Button({ variant = "primary", pending = false, icon, className = "", children, disabled, type = "button", ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClasses(variant, className)} disabled={disabled || pending} aria-busy={pending || undefined} {...rest}>
      {pending ? <Spinner size="sm" label="" /> : icon}
      {children}
    </button>
  );
}

export function ButtonLink({ variant = "primary", className = "", ...rest }: LinkProps & { variant?: Variant }) {
  return <Link className={buttonClasses(variant, className)} {...rest} />;
}
