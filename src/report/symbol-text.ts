/**
 * Readable form of a formula symbol: Greek names become Greek letters, trailing digits become
 * subscripts, and underscore-separated parts are run together as a subscript-like suffix.
 *
 *     symbolText('gamma')    // "γ"
 *     symbolText('sigma_h')  // "σh"
 *     symbolText('z0')       // "z₀"
 *     symbolText('Delta_L')  // "ΔL"
 */
const GREEK: Record<string, string> = {
  alpha: 'α', beta: 'β', gamma: 'γ', delta: 'δ', epsilon: 'ε', zeta: 'ζ', eta: 'η', theta: 'θ',
  iota: 'ι', kappa: 'κ', lambda: 'λ', mu: 'μ', nu: 'ν', xi: 'ξ', pi: 'π', rho: 'ρ', sigma: 'σ',
  tau: 'τ', phi: 'φ', chi: 'χ', psi: 'ψ', omega: 'ω',
  Gamma: 'Γ', Delta: 'Δ', Theta: 'Θ', Lambda: 'Λ', Xi: 'Ξ', Pi: 'Π', Sigma: 'Σ', Phi: 'Φ',
  Psi: 'Ψ', Omega: 'Ω',
};

const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';

function part(text: string): string {
  const greek = GREEK[text];
  if (greek) return greek;
  const match = /^([A-Za-z]+?)(\d+)$/.exec(text);
  if (match) {
    const head = match[1] ?? '';
    const digits = (match[2] ?? '').replace(/\d/g, (d) => SUBSCRIPT_DIGITS[Number(d)] ?? d);
    return (GREEK[head] ?? head) + digits;
  }
  return text;
}

export function symbolText(name: string): string {
  return name
    .split('_')
    .filter((p) => p.length > 0)
    .map(part)
    .join('');
}
