import { cva, type VariantProps } from "class-variance-authority";
import type { ButtonHTMLAttributes } from "react";
import { cn } from "@/lib/cn.ts";

const buttonVariants = cva(
  "inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-card px-4 font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-55",
  {
    variants: {
      variant: {
        primary: "bg-accent text-accent-ink hover:brightness-110",
        secondary: "border-2 border-rule bg-surface text-ink hover:border-ink",
        quiet: "text-ink hover:bg-sunken",
        danger: "bg-fault text-white hover:brightness-110",
      },
      size: { md: "text-base", lg: "min-h-14 px-6 text-lg" },
    },
    defaultVariants: { variant: "primary", size: "md" },
  },
);

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & VariantProps<typeof buttonVariants>;

export function Button({ className, variant, size, type = "button", ...props }: ButtonProps) {
  return <button type={type} className={cn(buttonVariants({ variant, size }), className)} {...props} />;
}

export { buttonVariants };
