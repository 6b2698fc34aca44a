export function SubmitButton({ children, pending, testId, tone = 'primary' }: { children: React.ReactNode; pending: boolean; testId?: string; tone?: 'primary' | 'quiet' | 'danger' }) {
  const tones = {
    primary: 'bg-ket-600 text-white hover:bg-ket-700',
    quiet: 'border border-ket-500 text-ket-700 hover:bg-ket-50',
    danger: 'border border-caution-500 text-caution-700 hover:bg-caution-50',
  } as const;
  return (
    <button type="submit" disabled={pending} data-testid={testId} className={`rounded-md px-4 py-2 text-sm font-semibold disabled:opacity-60 ${tones[tone]}`}>
      {pending ? 'Working…' : children}
    </button>
  );
}
