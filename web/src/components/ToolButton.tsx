import type { ButtonHTMLAttributes } from "react";

/** A small bordered button for panel tools (undo, snap, copy …); `pressed` marks a toggle that is on. */
export function ToolButton({
  pressed,
  className = "",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { pressed?: boolean }) {
  return (
    <button
      type="button"
      aria-pressed={pressed}
      {...props}
      className={`rounded-sm border px-2 py-0.5 text-[13px] leading-5 disabled:cursor-default disabled:opacity-45 ${
        pressed
          ? "border-ink bg-ink-wash font-semibold text-ink"
          : "border-rule-strong bg-panel text-graphite hover:border-ink hover:text-ink"
      } ${className}`}
    />
  );
}
