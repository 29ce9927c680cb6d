/**
 * RODAS4: a 6-stage, order 4(3), L-stable and stiffly accurate Rosenbrock method with a
 * third-order dense output. Coefficients from E. Hairer & G. Wanner, Solving Ordinary Differential
 * Equations II, 2nd ed. (Springer 1996), section VI.4 (method RODAS), as printed in the coefficient
 * routine of their Fortran code rodas.f, in the transformed form without matrix–vector products:
 *   (1/(hγ) I − J) u_i = f(t + c_i h, y + Σ a_ij u_j) + Σ (c_ij / h) u_j + h d_i ∂f/∂t,
 *   y1 = y + Σ_{j≤5} a_5j u_j + u_5 + u_6,  error estimate u_6,
 *   y(t + θh) = (1−θ) y0 + θ (y1 + (1−θ)(q1 + θ q2)),  q1 = Σ h_2j u_j,  q2 = Σ h_3j u_j.
 */
export const RODAS4 = {
  gamma: 0.25,
  c: [0, 0.386, 0.21, 0.63, 1, 1],
  d: [0.25, -0.1043, 0.1035, -0.03620000000000023, 0, 0],
  a: [
    [],
    [1.544],
    [0.9466785280815826, 0.2557011698983284],
    [3.314825187068521, 2.896124015972201, 0.9986419139977817],
    [1.221224509226641, 6.019134481288629, 12.53708332932087, -0.687886036105895],
  ],
  cMatrix: [
    [],
    [-5.6688],
    [-2.430093356833875, -0.2063599157091915],
    [-0.1073529058151375, -9.594562251023355, -20.47028614809616],
    [7.496443313967647, -10.24680431464352, -33.99990352819905, 11.7089089320616],
    [8.083246795921522, -7.981132988064893, -31.52159432874371, 16.31930543123136, -6.058818238834054],
  ],
  dense: [
    [10.12623508344586, -7.487995877610167, -34.80091861555747, -7.992771707568823, 1.025137723295662],
    [-0.6762803392801253, 6.087714651680015, 16.43084320892478, 24.76722511418386, -6.594389125716872],
  ],
} as const;
