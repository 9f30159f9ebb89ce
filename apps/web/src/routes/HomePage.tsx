import { HealthStatus } from '../components/HealthStatus';

export function HomePage() {
  return (
    <section className="space-y-6">
      <h1 className="font-display text-4xl font-semibold leading-tight">
        Rank numbers, proven bounds and certificates
      </h1>
      <p className="max-w-2xl text-lg text-lichen-700">
        Cairn labels the vertices of a graph so that every path between two equal labels climbs over a larger
        one, with as few labels as it can, and says how far from the optimum that is.
      </p>
      <HealthStatus />
    </section>
  );
}
