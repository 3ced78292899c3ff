/** The Layout section's line icon: turf strips with a seam; decorative, so hidden from screen readers. */
export function LayoutIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 24 24"
      fill="none"
      stroke="currentColor"
      strokeWidth={1.8}
      strokeLinecap="round"
      strokeLinejoin="round"
      className={className}
    >
      <rect x="3" y="4" width="18" height="16" rx="1.5" />
      <path d="M12 4v16" strokeDasharray="2.5 2" />
      <path d="M7 15V9M5.5 10.5 7 9l1.5 1.5M17 15V9M15.5 10.5 17 9l1.5 1.5" />
    </svg>
  );
}
