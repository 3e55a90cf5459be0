/**
 * Sigmacube's mark: the visible corner of a stress element, each face carrying the
 * arrow of a principal stress (one in tension, one in compression, one neutral).
 * Same drawing as web/public/favicon.svg.
 */
export function LogoMark({ size = 28, title }: { size?: number; title?: string }) {
  return (
    <svg
      width={size}
      height={size}
      viewBox="0 0 64 64"
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
    >
      <path
        d="M32 22 L48 31 L32 40 L16 31 Z"
        className="fill-ink-wash stroke-ink"
        strokeWidth={2.5}
        strokeLinejoin="round"
      />
      <path
        d="M16 31 L32 40 L32 58 L16 49 Z"
        className="fill-compression-wash stroke-ink"
        strokeWidth={2.5}
        strokeLinejoin="round"
      />
      <path
        d="M48 31 L32 40 L32 58 L48 49 Z"
        className="fill-tension-wash stroke-ink"
        strokeWidth={2.5}
        strokeLinejoin="round"
      />
      <g fill="none" strokeWidth={3} strokeLinecap="round" strokeLinejoin="round">
        <path d="M32 31 V6 M26 12 L32 5 L38 12" className="stroke-tension" />
        <path d="M24 45 L6 54 M8 46 L5 55 L14 56" className="stroke-graphite" />
        <path d="M40 45 L58 54 M50 56 L59 55 L56 46" className="stroke-compression" />
      </g>
    </svg>
  );
}
