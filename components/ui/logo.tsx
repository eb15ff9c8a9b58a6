/** The Presswright mark: a crosshead on two columns, the ram coming down onto the bolster. */
export function LogoMark({ className = "h-8 w-8" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <rect width="32" height="32" rx="6" fill="#18222a" />
      <rect x="6" y="5" width="20" height="4" rx="1" fill="#e6eaee" />
      <rect x="7" y="9" width="3" height="18" fill="#a9b6c1" />
      <rect x="22" y="9" width="3" height="18" fill="#a9b6c1" />
      <rect x="14" y="9" width="4" height="7" fill="#cf8118" />
      <rect x="12" y="16" width="8" height="3" rx="1" fill="#e39a32" />
      <rect x="6" y="24" width="20" height="3" rx="1" fill="#e6eaee" />
    </svg>
  );
}

export function Wordmark() {
  return (
    <span className="flex items-center gap-2 font-semibold tracking-tight">
      <LogoMark />
      <span className="text-lg">Presswright</span>
    </span>
  );
}
