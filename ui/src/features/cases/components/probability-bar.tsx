import { formatProbability } from '../lib/case-list';

/** A probability as a bar with its number beside it (the number is what screen readers read). */
export function ProbabilityBar({ probability, label, strong = false }: { probability: number; label?: string; strong?: boolean }) {
  const pct = Math.max(0, Math.min(100, probability * 100));
  const text = formatProbability(probability);
  return (
    <span className={strong ? 'fw-prob fw-prob-strong' : 'fw-prob'}>
      <span className="fw-prob-track" aria-hidden="true">
        <span className="fw-prob-fill" style={{ width: `${pct}%` }} />
      </span>
      <span className="fw-prob-number">
        {text}
        {label && <span className="fw-visually-hidden"> {label}</span>}
      </span>
    </span>
  );
}
