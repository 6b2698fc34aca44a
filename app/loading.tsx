export default function Loading() {
  return (
    <p aria-live="polite" aria-busy="true" className="text-ink-soft">
      Loading…
    </p>
  );
}
