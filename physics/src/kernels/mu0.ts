/**
 * Magnetic constant mu0 in H/m.
 *
 * The classical value 4 pi 1e-7 H/m. Since the 2019 SI revision mu0 is measured; CODATA 2018 gives
 * 1.25663706212e-6 H/m, 5.5e-10 relative above it — far below any filament-model error, and the
 * classical value keeps our results comparable with the published inductance literature.
 *
 * References: BIPM, The International System of Units (SI), 9th edition, 2019.
 */
export const MU0 = 4e-7 * Math.PI;
