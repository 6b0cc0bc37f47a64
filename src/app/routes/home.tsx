import { useHealth } from '@/features/system/api/get-health';

const STEPS = [
  ['Measure', 'Bust, hip, length and armhole depth, taken at the fitting.'],
  ['Test the stretch', 'Relaxed and stretched length across the grain give the stretch percent.'],
  ['Draft', 'Negative ease at the bust, a quarter of the body on fabric folded in four.'],
  ['Print and cut', 'True-scale tiles or a wide sheet, and a ticket for the cutter.'],
] as const;

export function HomeRoute() {
  const health = useHealth();
  const up = health.data?.database === 'up';
  return (
    <div className="space-y-8">
      <section>
        <h1 className="text-3xl font-semibold tracking-tight">Made-to-measure knits, drafted exactly</h1>
        <p className="mt-2 max-w-2xl text-lg text-muted">
          Knitwright turns a client&rsquo;s measurements and a fabric&rsquo;s stretch into true-scale pattern pieces, and keeps
          your studio&rsquo;s records around them.
        </p>
      </section>
      <ol className="grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
        {STEPS.map(([title, text], i) => (
          <li key={title} className="rounded-xl border border-line bg-panel p-5">
            <span className="num text-sm font-semibold text-accent">{i + 1}</span>
            <h2 className="mt-1 font-semibold">{title}</h2>
            <p className="mt-1 text-sm text-muted">{text}</p>
          </li>
        ))}
      </ol>
      <section aria-live="polite" className="flex items-center gap-3 rounded-xl border border-line bg-panel p-4 text-sm">
        <span aria-hidden className={`h-2.5 w-2.5 rounded-full ${health.isPending ? 'bg-line' : up ? 'bg-accent' : 'bg-danger'}`} />
        <span data-testid="server-status">
          {health.isPending ? 'Checking the server…' : up ? 'Server and database are running.' : 'The database is not answering. Your work cannot be saved until it is back.'}
        </span>
      </section>
    </div>
  );
}
