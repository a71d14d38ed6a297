/**
 * A plan-view drawing for the landing page: a truck with four outrigger pads, the swing arc from pick to set,
 * and the support outline dashed. Illustration only; no figures in it come from a computation.
 */
export function PlanSketch({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 420 320" role="img" aria-label="Plan-view sketch: a truck on four outrigger pads swinging a load along an arc" className={className}>
      <defs>
        <pattern id="ps-grid" width="20" height="20" patternUnits="userSpaceOnUse">
          <path d="M20 0H0V20" fill="none" stroke="#15202B" strokeOpacity="0.08" />
        </pattern>
        <pattern id="ps-hatch" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
          <line x1="0" y1="0" x2="0" y2="6" stroke="#0F5C63" strokeWidth="2" />
        </pattern>
      </defs>
      <rect width="420" height="320" rx="12" fill="#FFFFFF" />
      <rect width="420" height="320" rx="12" fill="url(#ps-grid)" />
      {/* support outline through the pads */}
      <path d="M120 92 L300 92 L300 228 L120 228 Z" fill="#D5ECEE" fillOpacity="0.55" stroke="#0F5C63" strokeWidth="2" strokeDasharray="7 5" />
      {/* outrigger beams and pads with cribbing */}
      {[
        [150, 120, 120, 92],
        [270, 120, 300, 92],
        [150, 200, 120, 228],
        [270, 200, 300, 228],
      ].map(([x1, y1, x2, y2], i) => (
        <g key={i}>
          <line x1={x1} y1={y1} x2={x2} y2={y2} stroke="#15202B" strokeWidth="6" strokeLinecap="round" />
          <rect x={x2 - 13} y={y2 - 13} width="26" height="26" rx="3" fill="url(#ps-hatch)" stroke="#15202B" strokeWidth="2.5" />
        </g>
      ))}
      {/* carrier: body, cab, tailboard */}
      <rect x="140" y="128" width="150" height="64" rx="6" fill="#3A4A5A" />
      <rect x="290" y="132" width="38" height="56" rx="8" fill="#15202B" />
      <rect x="132" y="132" width="10" height="56" rx="2" fill="#15202B" />
      {/* swing arc pick → set */}
      <path d="M110 250 A118 118 0 0 1 92 120" fill="none" stroke="#F2A900" strokeWidth="7" strokeLinecap="round" />
      <path d="M86 128 l6 -12 l9 10" fill="none" stroke="#F2A900" strokeWidth="5" strokeLinecap="round" strokeLinejoin="round" />
      {/* boom from the slew axis to the load */}
      <circle cx="200" cy="160" r="16" fill="#15202B" stroke="#F2A900" strokeWidth="3" />
      <line x1="200" y1="160" x2="104" y2="244" stroke="#FFFFFF" strokeWidth="9" strokeLinecap="round" />
      <line x1="200" y1="160" x2="104" y2="244" stroke="#15202B" strokeWidth="5" strokeLinecap="round" />
      {/* load at the pick, set zone */}
      <circle cx="100" cy="252" r="17" fill="#F2A900" stroke="#15202B" strokeWidth="3" />
      <circle cx="100" cy="252" r="6" fill="#15202B" />
      <rect x="48" y="82" width="74" height="40" rx="4" fill="none" stroke="#15202B" strokeWidth="2.5" strokeDasharray="5 4" />
      <text x="85" y="74" textAnchor="middle" fontSize="13" fontWeight="700" fill="#15202B">SET</text>
      <text x="100" y="292" textAnchor="middle" fontSize="13" fontWeight="700" fill="#15202B">PICK</text>
      {/* power line */}
      <line x1="20" y1="30" x2="400" y2="44" stroke="#B3261E" strokeWidth="2.5" strokeDasharray="14 6 3 6" />
      <text x="396" y="34" textAnchor="end" fontSize="12" fontWeight="700" fill="#B3261E">OVERHEAD LINE</text>
      {/* scale bar */}
      <g transform="translate(300 290)">
        <rect width="40" height="6" fill="#15202B" />
        <rect x="40" width="40" height="6" fill="#FFFFFF" stroke="#15202B" />
        <text x="0" y="-5" fontSize="11" fill="#3A4A5A">0</text>
        <text x="80" y="-5" textAnchor="end" fontSize="11" fill="#3A4A5A">20 ft</text>
      </g>
    </svg>
  );
}
