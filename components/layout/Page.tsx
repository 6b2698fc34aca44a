export function PageTitle({ children, subtitle }: { children: React.ReactNode; subtitle?: React.ReactNode }) {
  return (
    <div className="mb-6">
      <h1 className="text-2xl font-bold tracking-tight text-ink" data-testid="page-title">
        {children}
      </h1>
      {subtitle ? <p className="mt-1 text-ink-soft">{subtitle}</p> : null}
    </div>
  );
}

export function Section({ title, children, testId }: { title: string; children: React.ReactNode; testId?: string }) {
  return (
    <section className="mb-6 rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label={title} data-testid={testId}>
      <h2 className="mb-3 text-lg font-semibold text-ink">{title}</h2>
      {children}
    </section>
  );
}

export function NarrowCard({ children }: { children: React.ReactNode }) {
  return <div className="mx-auto max-w-md rounded-xl border border-ink-soft/15 bg-white p-6 shadow-sm">{children}</div>;
}
