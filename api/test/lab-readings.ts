/*
 * Invented lab readings of a soft compound, uniaxial and planar. Not Mooney–Rivlin data, so
 * a fit's weights and model change its constants.
 */
export const uniaxial = [1.1, 1.3, 1.5, 1.8, 2.1, 2.5].map((stretch) => ({
  stretch,
  stress: Number((0.6 * (stretch - stretch ** -2) * (1 + 0.1 / stretch)).toFixed(4)),
}));

export const planar = [1.1, 1.3, 1.6, 2.0].map((stretch) => ({
  stretch,
  stress: Number((0.66 * (stretch - stretch ** -3)).toFixed(4)),
}));
