import { linkify } from '@/app/lib/linkify';

/** A mail's text body with its links clickable; the text is never parsed as HTML. */
export function MailBody({ text }: { text: string }) {
  return (
    <pre className="whitespace-pre-wrap break-words rounded-lg bg-white p-4 font-sans text-sm leading-6 text-ink shadow-sm" data-testid="mail-body">
      {linkify(text).map((piece, i) =>
        piece.kind === 'text' ? (
          <span key={i}>{piece.text}</span>
        ) : (
          <a key={i} href={piece.href} className="text-ket-600 underline" data-testid="mail-link">
            {piece.href}
          </a>
        ),
      )}
    </pre>
  );
}
