/** Seamwright's own small line icons; decorative, so hidden from screen readers. */
const base = {
  'aria-hidden': true,
  viewBox: '0 0 24 24',
  fill: 'none',
  stroke: 'currentColor',
  strokeWidth: 1.8,
  strokeLinecap: 'round',
  strokeLinejoin: 'round',
} as const;

export function TodayIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <circle cx="12" cy="12" r="4" />
      <path d="M12 2v2.5M12 19.5V22M2 12h2.5M19.5 12H22M4.9 4.9l1.8 1.8M17.3 17.3l1.8 1.8M4.9 19.1l1.8-1.8M17.3 6.7l1.8-1.8" />
    </svg>
  );
}

export function CustomersIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <path d="M3 20v-1a5 5 0 0 1 5-5h2a5 5 0 0 1 5 5v1" />
      <circle cx="9" cy="8" r="3.5" />
      <path d="M16 4.5a3.5 3.5 0 0 1 0 7M21 20v-1a5 5 0 0 0-3-4.6" />
    </svg>
  );
}

/** A clipboard: a job and its paperwork. */
export function JobsIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <rect x="5" y="4" width="14" height="17" rx="2" />
      <path d="M9 4V3h6v1M9 10h6M9 14h6M9 18h3" />
    </svg>
  );
}

/** A sheet with a few lines and a total: an invoice. */
export function InvoicesIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <path d="M6 3h9l3 3v15l-2-1.2-2 1.2-2-1.2-2 1.2-2-1.2L6 21z" />
      <path d="M9 9h6M9 12.5h6M12 16h3" />
    </svg>
  );
}

/** A wall calendar with a booked span across it. */
export function CalendarIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <rect x="3.5" y="5" width="17" height="15" rx="2" />
      <path d="M3.5 10h17M8 3v4M16 3v4M7 14h10" />
    </svg>
  );
}

/** Two turf rolls on the floor, seen end on, with a third on top: stock in the yard. */
export function ReportsIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <path d="M4 20h16" />
      <path d="M7 16v-5" />
      <path d="M12 16V7" />
      <path d="M17 16v-8" />
    </svg>
  );
}

export function StockIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <circle cx="7" cy="16" r="4" />
      <circle cx="17" cy="16" r="4" />
      <circle cx="12" cy="8" r="4" />
      <circle cx="7" cy="16" r="1" />
      <circle cx="17" cy="16" r="1" />
      <circle cx="12" cy="8" r="1" />
    </svg>
  );
}

export function SettingsIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <path d="M4 6h10M18 6h2M4 12h4M12 12h8M4 18h12M20 18h0" />
      <circle cx="16" cy="6" r="2" />
      <circle cx="10" cy="12" r="2" />
      <circle cx="18" cy="18" r="2" />
    </svg>
  );
}

export function ProfileIcon({ className = 'h-6 w-6' }: { className?: string }) {
  return (
    <svg {...base} className={className}>
      <circle cx="12" cy="8" r="4" />
      <path d="M4.5 21v-1.5A5.5 5.5 0 0 1 10 14h4a5.5 5.5 0 0 1 5.5 5.5V21" />
    </svg>
  );
}

export function TurfMark({ className = 'h-7 w-7' }: { className?: string }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 32 32" className={className}>
      <rect x="2" y="2" width="28" height="28" rx="6" fill="currentColor" />
      <path
        d="M9 22c2-6 3-9 4-12M15 22c1-5 2-8 2-11M21 22c0-4 1-7 2-9"
        stroke="#1f3d2b"
        strokeWidth="2.2"
        strokeLinecap="round"
        fill="none"
      />
    </svg>
  );
}
