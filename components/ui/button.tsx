import type { ButtonHTMLAttributes } from "react";

export type ButtonVariant = "primary" | "secondary" | "danger";

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
}

const VARIANTS: Record<ButtonVariant, string> = {
  primary: "bg-harbour text-paper hover:bg-harbour-deep border-harbour",
  secondary: "bg-paper text-harbour-deep hover:bg-harbour-soft border-harbour",
  danger: "bg-paper text-ember-deep hover:bg-ember-soft border-ember",
};

export function buttonClasses(variant: ButtonVariant = "primary", extra = ""): string {
  return `inline-flex min-h-11 items-center justify-center gap-2 rounded-plate border-2 px-4 py-2 font-bold no-underline disabled:cursor-not-allowed disabled:opacity-60 ${VARIANTS[variant]} ${extra}`;
}

export function Button({ variant = "primary", className = "", type = "button", ...props }: ButtonProps) {
  return <button type={type} className={buttonClasses(variant, className)} {...props} />;
}
