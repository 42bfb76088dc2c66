import type { ButtonHTMLAttributes } from "react";

const looks = {
  primary: "bg-spruce-700 text-maple-50 hover:bg-spruce-800 disabled:bg-graphite-400",
  secondary: "border border-graphite-400 bg-white text-graphite-900 hover:bg-maple-100 disabled:border-dashed disabled:bg-maple-100 disabled:text-graphite-600",
  danger: "border border-alarm-600 bg-white text-alarm-700 hover:bg-alarm-50 disabled:border-dashed disabled:border-graphite-400 disabled:bg-maple-100 disabled:text-graphite-600",
  quiet: "text-spruce-700 hover:bg-maple-100 disabled:bg-transparent disabled:text-graphite-600",
} as const;

export function Button({
  look = "primary",
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { look?: keyof typeof looks }) {
  return (
    <button
      className={`inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-semibold transition-colors disabled:cursor-not-allowed ${looks[look]} ${className}`}
      {...props}
    />
  );
}
