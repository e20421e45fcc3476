/** Text shown beside every result. */
export const CAUTIONS = [
  {
    code: 'HOT_SURFACES',
    title: 'Hot surfaces',
    text: 'Exhaust parts run hot enough to burn skin on contact and stay hot long after the engine stops. Guard and label them.',
  },
  {
    code: 'WELD_FUME',
    title: 'Weld fume',
    text: 'Welding stainless steels and nickel alloys gives off fume with hexavalent chromium and nickel compounds, which cause cancer. Use local extraction and suitable respiratory protection.',
  },
  {
    code: 'FIRE',
    title: 'Fire',
    text: 'Hot pipework far exceeds the ignition temperature of fuel and oil. Keep clearance and heat shielding from fuel, oil and brake lines and from wiring.',
  },
  {
    code: 'SIMPLIFIED_CHECKS',
    title: 'Simplified checks',
    text: "Joint sizing checks movements against the part maker's ratings and fits against stated allowances, and the restrained stress is an elastic flag. None of it is a stress analysis, a pressure, spring-force or fatigue design, or a code check: the part maker's ratings and instructions, the applicable codes and a qualified engineer decide.",
  },
  {
    code: 'GUIDANCE_ONLY',
    title: 'Guidance only',
    text: "Results are guidance from typical data. Local codes and regulations, the alloy supplier's certified data and licensed engineering practice take precedence.",
  },
] as const;
