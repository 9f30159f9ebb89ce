import { Link } from 'react-router';

export function NotFoundPage() {
  return (
    <section className="space-y-4">
      <h1 className="font-display text-3xl font-semibold">Nothing here</h1>
      <p>
        This address names no page of Cairn. <Link to="/" className="text-ochre-700 underline">Back to the start</Link>.
      </p>
    </section>
  );
}
