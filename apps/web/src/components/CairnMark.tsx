/** Cairn's mark: four stones, each resting on a wider one, the way labels rest on larger labels. */
export function CairnMark({ className = 'h-8 w-8' }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <ellipse cx="16" cy="26" rx="12" ry="4.5" className="fill-lichen-700" />
      <ellipse cx="16" cy="18.5" rx="8.5" ry="3.8" className="fill-lichen-500" />
      <ellipse cx="16" cy="12" rx="5.5" ry="3.2" className="fill-lichen-300" />
      <ellipse cx="16" cy="6.4" rx="3" ry="2.2" className="fill-ochre-500" />
    </svg>
  );
}
