/** A putt seen from above on a green that falls to the golfer's right: the dying pace needs
 *  a wider start line than the firm one. Drawn for the home page; not to scale. */
export function BreakDiagram({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 320 400" role="img" aria-labelledby="break-diagram-title break-diagram-desc" className={className}>
      <title id="break-diagram-title">How pace changes the read</title>
      <desc id="break-diagram-desc">
        Seen from above, a putt on a green that falls to the right. A dying putt curves more and must start further left than a firm one.
      </desc>
      <defs>
        <pattern id="break-diagram-grid" width="20" height="20" patternUnits="userSpaceOnUse">
          <path d="M20 0H0V20" fill="none" className="stroke-sand-50/5" strokeWidth="1" />
        </pattern>
        <marker id="break-diagram-arrow" viewBox="0 0 10 10" refX="8" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
          <path d="M0 0L10 5L0 10z" className="fill-sand-200" />
        </marker>
      </defs>
      <rect width="320" height="400" rx="20" className="fill-ink-800" />
      <rect width="320" height="400" rx="20" fill="url(#break-diagram-grid)" />

      {/* fall line */}
      <g className="text-sand-200">
        <line x1="226" y1="214" x2="286" y2="214" className="stroke-sand-200" strokeWidth="2" markerEnd="url(#break-diagram-arrow)" />
        <text x="256" y="236" textAnchor="middle" className="fill-sand-200 text-[11px]">
          falls this way
        </text>
      </g>

      {/* straight line ball to hole */}
      <line x1="200" y1="352" x2="200" y2="68" className="stroke-sand-50/25" strokeWidth="1.5" strokeDasharray="2 6" />

      {/* start lines to the aim spots at the hole's distance */}
      <line x1="200" y1="352" x2="106" y2="64" className="stroke-coral-300/60" strokeWidth="1.5" strokeDasharray="5 5" />
      <line x1="200" y1="352" x2="142" y2="64" className="stroke-sand-200/50" strokeWidth="1.5" strokeDasharray="5 5" />

      {/* the rolls */}
      <path d="M200 352 C 168 254, 128 104, 200 64" fill="none" className="stroke-coral-400" strokeWidth="4" strokeLinecap="round" />
      <path d="M200 352 C 176 232, 168 128, 200 64" fill="none" className="stroke-sand-200" strokeWidth="3" strokeLinecap="round" />

      {/* aim spots */}
      <circle cx="106" cy="64" r="5" className="fill-coral-400" />
      <circle cx="142" cy="64" r="4.5" className="fill-sand-200" />

      {/* aim offset */}
      <line x1="106" y1="34" x2="200" y2="34" className="stroke-sand-50/60" strokeWidth="1.5" />
      <line x1="106" y1="28" x2="106" y2="40" className="stroke-sand-50/60" strokeWidth="1.5" />
      <line x1="200" y1="28" x2="200" y2="40" className="stroke-sand-50/60" strokeWidth="1.5" />
      <text x="153" y="24" textAnchor="middle" className="fill-sand-50 text-[11px]">
        aim offset
      </text>

      {/* hole and ball */}
      <circle cx="200" cy="64" r="10" className="fill-ink-950 stroke-sand-50" strokeWidth="2" />
      <circle cx="200" cy="352" r="7" className="fill-sand-50" />

      {/* legend */}
      <g transform="translate(20 330)">
        <line x1="0" y1="0" x2="22" y2="0" className="stroke-coral-400" strokeWidth="4" strokeLinecap="round" />
        <text x="30" y="4" className="fill-sand-50 text-[12px]">
          dying pace
        </text>
        <line x1="0" y1="24" x2="22" y2="24" className="stroke-sand-200" strokeWidth="3" strokeLinecap="round" />
        <text x="30" y="28" className="fill-sand-50 text-[12px]">
          firm pace
        </text>
      </g>
    </svg>
  );
}
