export default function WorkspaceLoading() {
  return (
    <div aria-busy="true" aria-live="polite" className="animate-pulse">
      <div className="mb-4 h-8 w-64 rounded bg-ket-100" />
      <div className="mb-6 h-32 rounded-xl bg-white" />
      <div className="h-32 rounded-xl bg-white" />
      <span className="sr-only">Loading the workspace…</span>
    </div>
  );
}
