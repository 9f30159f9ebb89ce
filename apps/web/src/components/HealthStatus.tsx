import { useHealth } from '../api/health';

/** Says in words whether the server and its database answer. */
export function HealthStatus() {
  const health = useHealth();
  let tone = 'bg-stone-100 text-slate-ink';
  let text = 'Checking the server…';
  if (health.isError) {
    tone = 'bg-alarm-600 text-stone-50';
    text = `Server unreachable: ${health.error.message}`;
  } else if (health.data?.db === 'ok') {
    tone = 'bg-lichen-700 text-stone-50';
    text = 'Server up · database reachable';
  } else if (health.data) {
    tone = 'bg-ochre-700 text-stone-50';
    text = 'Server up · database unreachable';
  }
  return (
    <p role="status" data-testid="health-status" className={`inline-flex items-center gap-2 rounded-full px-4 py-1.5 text-sm ${tone}`}>
      {text}
      {health.data?.reason && <span className="text-xs opacity-90">{health.data.reason}</span>}
      {health.data && <span className="font-mono text-xs opacity-80">v{health.data.version}</span>}
    </p>
  );
}
