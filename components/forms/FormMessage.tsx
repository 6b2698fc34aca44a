/** The form-level message (errors not tied to one field, or a success note), announced politely. */
export function FormMessage({ message, tone = 'error', testId = 'form-message' }: { message: string | null; tone?: 'error' | 'ok'; testId?: string }) {
  return (
    <div aria-live="polite" role="status" data-testid={testId} className="min-h-6">
      {message ? (
        <p className={tone === 'error' ? 'rounded-md bg-caution-50 px-3 py-2 text-sm text-caution-700' : 'rounded-md bg-ket-50 px-3 py-2 text-sm text-ket-700'}>
          {message}
        </p>
      ) : null}
    </div>
  );
}
