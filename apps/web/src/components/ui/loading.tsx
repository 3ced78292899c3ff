/** A calm placeholder while a page's data loads. */
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-8 text-center text-ink-muted">
      {label}
    </p>
  );
}
