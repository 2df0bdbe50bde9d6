"""Short-wave spectrum from a local energy balance (Kudryavtsev et al.; Yurovskaya et al. 2013).

The second spectrum model of :mod:`shortwave.spectrum`, key ``"yurovskaya2013"``: the
semi-empirical model of Kudryavtsev, Makin & Chapron (1999) and Kudryavtsev, Hauser,
Caudal & Chapron (2003), in the revision of Yurovskaya, Dulov, Chapron & Kudryavtsev (2013,
Appendix A) which uses the wind growth rate of Kudryavtsev & Makin (2004).  The short-wave
directional saturation spectrum B(k, phi) solves, at every wave vector, the balance of wind
input, viscous damping, non-linear dissipation and generation by breaking of longer waves:

    Q(B) = beta_nu B - B (B/alpha)^n + Q_b = 0,   beta_nu = beta - 4 nu k^2 / omega

and is joined to the Elfouhaily et al. (1997) long-wave part.  Unlike ECKV, the model is
not centrosymmetric (downwind > upwind); viscosity and surface tension come from the
:class:`shortwave.Water`, so the capillary cut-off depends on temperature and salinity.

**Provenance.**  The printed papers were not available.  The equations follow the
restatement in the public ESA CIMR Level-2 Sea-Surface-Salinity ATBD, Appendix C
("Sea Surface Height spectral model", Eqs. C1-C25), which follows the papers above; the
equation numbers below are that document's.  Verified there: the composite form (C1),
the long-wave part (C2-C8), the balance (C9), the growth rate with c_beta = 1.2e-3 (C10),
the breaking sources with c_b = 4.5e-3 and k_bm = min(k/10, k_b) (C11-C12), the three
asymptotes, Newton iterations and the parasitic-capillary solution (C13-C19), n(k),
alpha(k), n_g = 10, C_beta = 0.03, a = 2e-3, k_b = k_gamma/4 (C20-C22) and the
parasitic filter with k_pc = (3/2) k_gamma and 4 k_gamma (C23).  **Not verified**
(choices of this implementation, each a documented parameter or stated below):

* the wind profile U_k at height 1/k: neutral log law with a Charnock roughness
  z0 = 0.011 u*^2/g (from memory);
* the parasitic source argument K = k_gamma^2/k (the ATBD prints k_gamma^2; read as a
  typesetting slip, from dimensional consistency and KMC99), and its direction: the
  parasitic ripples take the direction of their carrier wave (interpretation);
* the join to the long waves: B = B_l + (1 - w) B_sw with w = min(1, exp(-Omega/sqrt(10)
  (sqrt(k/k_p) - 1))) (interpretation of C1, cut-off applied once) and ECKV spreading for
  B_l (the restatement gives no directional form for the long-wave part);
* the breaking source integral uses the whole spectrum B and beta (not beta_nu) as
  printed, and a negative total (possible only near the peak, where beta < 0) is set to 0.

**Numerics.**  Solved per wind on an internal grid (50 log-spaced wavenumbers per decade
from k_p/8 to 3e4 rad m-1, 73 directions on the half circle) and evaluated exactly at the
requested wavenumbers from the converged breaking sources.  Angular integrals are accurate
to about 0.5 % for B(k) and a few per cent for Delta(k) (the wind input switches on
steeply near the cross-wind direction).  About 0.1 s per wind speed.

References
----------
.. [1] Kudryavtsev, V. N., Makin, V. K. and Chapron, B. (1999). Coupled sea surface-
   atmosphere model 2. Spectrum of short wind waves. J. Geophys. Res. 104(C4), 7625-7639.
.. [2] Kudryavtsev, V., Hauser, D., Caudal, G. and Chapron, B. (2003). A semiempirical
   model of the normalized radar cross-section of the sea surface 1. Background model.
   J. Geophys. Res. 108(C3), 8054.
.. [3] Yurovskaya, M. V., Dulov, V. A., Chapron, B. and Kudryavtsev, V. N. (2013).
   Directional short wind wave spectra derived from the sea surface photography.
   J. Geophys. Res. Oceans 118(9), 4380-4394, Appendix A.
.. [4] ESA CIMR Level-2 Sea Surface Salinity ATBD, Appendix C (restatement of [1]-[3]).
"""
from __future__ import annotations

import numpy as np

from ..water import as_liquid
from .models import eckv_parts
from .spreading import eckv_delta

__all__ = ["C_BETA", "C_B", "N_G", "A_LEVEL", "C_BETA_MEAN", "CHARNOCK", "yurovskaya2013",
           "yurovskaya2013_directional_curvature"]

C_BETA = 1.2e-3
"""Wind growth-rate constant c_beta (ATBD Eq. C10; Kudryavtsev & Makin 2004)."""
C_B = 4.5e-3
"""Breaking-source constant c_b (ATBD Eq. C12)."""
N_G = 10.0
"""Exponent n of the non-linear dissipation for gravity waves (ATBD Eq. C20)."""
A_LEVEL = 2e-3
"""Level constant a in ln alpha = ln a - ln(C_beta_mean)/n (ATBD Eq. C22)."""
C_BETA_MEAN = 0.03
"""Mean growth-rate constant C_beta in alpha(k) (ATBD Eq. C22)."""
CHARNOCK = 0.011
"""Charnock constant of z0 = 0.011 u*^2/g for the wind profile U_k (from memory)."""
KAPPA = 0.4
PC_LOW, PC_HIGH = 1.5, 4.0          # parasitic filter edges in units of k_gamma (Eq. C23)
N_PHI = 73                          # directions on [0, pi] (2.5 degree steps), mirror-symmetric
PER_DECADE = 50                     # internal wavenumber grid density
K_TOP = 3.0e4                       # top of the internal grid [rad m-1]


def _f4(x):
    x4 = x**4
    return x4 / (1.0 + x4)          # [1 + tanh(2 ln x)] / 2 (Eq. C21)


class _Setup:
    """Water and wind constants for a batch of spectra (arrays with trailing axes)."""

    def __init__(self, f):
        w = as_liquid(f.water)
        self.g = f.gravity
        self.gs = float(np.asarray(w.surface_tension) / np.asarray(w.density))
        self.nu = float(np.asarray(w.kinematic_viscosity))
        self.kgam = np.sqrt(self.g / self.gs)           # k_gamma (Eq. C21)
        self.kb = self.kgam / 4.0                       # k_b = k_gamma / 4 (Eq. C21)
        self.cm = np.sqrt(2.0 * self.g / self.kgam)

    def omega(self, k):
        return np.sqrt(self.g * k + self.gs * k**3)

    def n_alpha(self, k):
        inv_n = (1.0 - 1.0 / N_G) * _f4(k / self.kb) + 1.0 / N_G        # Eq. C20
        n = 1.0 / inv_n
        alpha = A_LEVEL * C_BETA_MEAN ** (-inv_n)                        # Eq. C22
        return n, alpha

    def beta(self, k, phi, ustar):
        """Wind growth rate (in units of omega), Eq. C10, U_k from a log profile."""
        c = self.omega(k) / k
        z0 = CHARNOCK * ustar**2 / self.g
        uk = ustar / KAPPA * np.maximum(np.log(1.0 / (k * z0)), 0.0)
        cphi = np.cos(phi)
        return C_BETA * (1.0 + cphi**2) * ustar * (uk * cphi - c) / c**2   # Eq. C10

    def viscous(self, k):
        return 4.0 * self.nu * k**2 / self.omega(k)                     # 4 nu k^2 / omega

    def pc_filter(self, k):
        return _f4(k / (PC_LOW * self.kgam)) - _f4(k / (PC_HIGH * self.kgam))  # Eq. C23


def _solve_wind(beta_nu, q, alpha, n, iters=60):
    """Positive root of beta_nu B - B (B/alpha)^n + q = 0 (Eqs. C9, C14-C18).

    Newton's method from the upper bound B_u = max(alpha (2 beta_nu)^(1/n),
    alpha^(n/(n+1)) (2 q)^(1/(n+1))), where Q(B_u) <= 0; Q is concave in B, so the
    iterates decrease monotonically to the root.
    """
    bp = np.maximum(beta_nu, 0.0)
    b = np.maximum(alpha * (2.0 * bp) ** (1.0 / n),
                   alpha ** (n / (n + 1.0)) * (2.0 * q) ** (1.0 / (n + 1.0)))
    for _ in range(iters):
        r = (b / alpha) ** n
        qv = beta_nu * b - b * r + q
        dq = beta_nu - (n + 1.0) * r
        step = np.where(dq < 0, qv / np.where(dq < 0, dq, -1.0), 0.0)
        bn = np.maximum(b - step, 0.0)
        if np.all(np.abs(bn - b) <= 1e-12 * np.maximum(bn, 1e-300)):
            b = bn
            break
        b = bn
    return b


def _solve_pc(visc, q, alpha):
    """Parasitic capillaries, balance with n = 1 and no wind (Eq. C19)."""
    return 0.5 * alpha * (-visc + np.sqrt(visc**2 + 4.0 * q / alpha))


class State:
    """Converged internal solution of a batch of spectra (rows), used to evaluate anywhere."""


def yurovskaya2013_state(f, iters=12, rtol=1e-7):
    """Solve the model on an internal grid for every forcing row (internal).

    ``f`` holds 1-D (rows,) arrays ``wind_speed``, ``omega``, ``ustar``.  Returns a State
    with the cumulative breaking-source integral I(k) and the dissipation D(k, phi) on a
    log-uniform grid per row, from which :func:`_evaluate` computes B anywhere.
    """
    s = _Setup(f)
    U = np.asarray(f.wind_speed, dtype=float)[:, None]
    om = np.asarray(f.omega, dtype=float)[:, None]
    us = np.asarray(f.ustar, dtype=float)[:, None]
    kp = s.g * om**2 / U**2
    lo = np.log(kp / 8.0)
    hi = np.log(K_TOP)
    nk = int(np.ceil((hi - np.nanmin(lo)) / np.log(10) * PER_DECADE)) + 1
    t = np.linspace(0.0, 1.0, nk)[None, :]
    lnk = lo + (hi - lo) * t                                    # (R, J)
    k = np.exp(lnk)
    phi = np.linspace(0.0, np.pi, N_PHI)
    wphi = np.full(N_PHI, phi[1] - phi[0])
    wphi[[0, -1]] *= 0.5
    wphi *= 2.0                                                 # full circle by symmetry
    K3, P3 = k[..., None], phi[None, None, :]
    n, alpha = s.n_alpha(K3)
    beta = s.beta(K3, P3, us[..., None])
    visc = s.viscous(K3)
    bnu = beta - visc
    lw = _long_wave(s, k, U, om, us)[..., None] * _eckv_shape(s, k, U, om, us, phi)
    wgt = _join_weight(k, kp, om)[..., None]
    omk = s.omega(K3)
    kbm = np.minimum(k / 10.0, s.kb)                            # k_bm (Eq. C12)
    I = np.zeros_like(k)
    D = np.zeros_like(bnu)
    B = lw
    for _ in range(iters):
        qw = np.maximum(C_B / omk[..., 0] * _interp_rows(I, lo, hi, np.log(kbm)), 0.0)
        bw = _solve_wind(bnu, qw[..., None], alpha, n)
        qpc = s.pc_filter(K3) * _interp_rows3(D, lo, hi, np.log(s.kgam**2 / k))
        bpc = _solve_pc(visc, qpc, alpha)
        Bn = lw + (1.0 - wgt) * (bw + bpc)                      # Eq. C1, C13
        D = Bn * (Bn / alpha) ** n                              # B (B/alpha)^n at each k
        G = np.sum(omk * beta * Bn * wphi, -1)                  # integrand of Eq. C12
        dl = (hi - lo) / (nk - 1)
        I = np.concatenate([np.zeros_like(G[:, :1]),
                            np.cumsum(0.5 * (G[:, 1:] + G[:, :-1]) * dl, -1)], -1)
        done = np.all(np.abs(Bn - B) <= rtol * np.maximum(np.abs(Bn), 1e-30))
        B = Bn
        if done:
            break
    st = State()
    st.setup, st.lo, st.hi, st.I, st.D, st.phi = s, lo[:, 0], hi, I, D, phi
    st.U, st.om, st.us = U[:, 0], om[:, 0], us[:, 0]
    return st


def _long_wave(s, k, U, om, us):
    b_l, _ = eckv_parts(k, U, om, us, s.kgam, s.cm, s.g)        # Eqs. C2-C8 (ECKV B_l)
    return b_l


def _eckv_shape(s, k, U, om, us, phi):
    d = eckv_delta(k, U, om, us, s.kgam, s.cm, s.g)
    return (1.0 + d[..., None] * np.cos(2.0 * phi)) / (2.0 * np.pi)


def _join_weight(k, kp, om):
    return np.minimum(1.0, np.exp(-om / np.sqrt(10.0) * (np.sqrt(k / kp) - 1.0)))


def _interp_rows(I, lo, hi, lnx):
    """Linear interpolation of I[r, :] (log-uniform grid of row r) at lnx[r, ...]."""
    R, J = I.shape
    lo = np.reshape(lo, (R,) + (1,) * (lnx.ndim - 1))
    pos = (lnx - lo) / (hi - lo) * (J - 1)
    inside = (pos >= 0) & (pos <= J - 1)
    p = np.clip(pos, 0, J - 1 - 1e-9)
    i0 = np.floor(p).astype(int)
    fr = p - i0
    rows = np.arange(R).reshape((R,) + (1,) * (lnx.ndim - 1))
    v = I[rows, i0] * (1 - fr) + I[rows, i0 + 1] * fr
    return np.where(inside, v, np.where(pos > J - 1, I[rows, -1] + 0 * fr, 0.0))


def _interp_rows3(D, lo, hi, lnx):
    """Like :func:`_interp_rows` for D[r, j, p] at lnx[r, j] -> [r, j, p]; 0 outside."""
    R, J, P = D.shape
    pos = (lnx - lo) / (hi - lo) * (J - 1)
    inside = (pos >= 0) & (pos <= J - 1)
    p = np.clip(pos, 0, J - 1 - 1e-9)
    i0 = np.floor(p).astype(int)
    fr = (p - i0)[..., None]
    rows = np.arange(R)[:, None]
    v = D[rows, i0] * (1 - fr) + D[rows, i0 + 1] * fr
    return np.where(inside[..., None], v, 0.0)


def _evaluate(st, k, row, phi=None):
    """B(k, phi) of the converged state at wavenumbers ``k`` of forcing rows ``row``.

    ``phi`` None: on the internal half-circle grid (returns [..., N_PHI]); else the
    direction [rad] of each element (same shape as k), any value (folded by symmetry).
    """
    s = st.setup
    U, om, us = st.U[row], st.om[row], st.us[row]
    kp = s.g * om**2 / U**2
    lo = st.lo[row]
    J = st.I.shape[1]

    def interp1(table, lnx):
        pos = (lnx - lo) / (st.hi - lo) * (J - 1)
        p = np.clip(pos, 0, J - 1 - 1e-9)
        i0 = np.floor(p).astype(int)
        fr = p - i0
        return table, i0, fr, (pos >= 0) & (pos <= J - 1), pos > J - 1

    _, i0, fr, inside, above = interp1(st.I, np.log(np.minimum(k / 10.0, s.kb)))
    Iv = st.I[row, i0] * (1 - fr) + st.I[row, i0 + 1] * fr
    Iv = np.where(inside, Iv, np.where(above, st.I[row, -1], 0.0))
    qw = np.maximum(C_B / s.omega(k) * Iv, 0.0)                 # Eq. C12
    _, j0, gr, jin, _ = interp1(st.D, np.log(s.kgam**2 / k))
    if phi is None:
        P = st.phi[None, :] if np.ndim(k) == 1 else st.phi
        kk = k[..., None]
        Dk = (st.D[row, j0] * (1 - gr[..., None]) + st.D[row, j0 + 1] * gr[..., None])
        Dk = np.where(jin[..., None], Dk, 0.0)
        qwx, ux, omx, usx, kpx = (qw[..., None], U[..., None], om[..., None],
                                  us[..., None], kp[..., None])
    else:
        a = np.abs(np.angle(np.exp(1j * phi)))                   # fold to [0, pi]
        pos = a / (st.phi[1] - st.phi[0])
        q0 = np.minimum(np.floor(pos).astype(int), N_PHI - 2)
        qf = pos - q0
        d00 = st.D[row, j0, q0] * (1 - gr) + st.D[row, j0 + 1, q0] * gr
        d01 = st.D[row, j0, q0 + 1] * (1 - gr) + st.D[row, j0 + 1, q0 + 1] * gr
        Dk = np.where(jin, d00 * (1 - qf) + d01 * qf, 0.0)
        P, kk = phi, k
        qwx, ux, omx, usx, kpx = qw, U, om, us, kp
    n, alpha = s.n_alpha(kk)
    bnu = s.beta(kk, P, usx) - s.viscous(kk)
    bw = _solve_wind(bnu, qwx, alpha, n)
    bpc = _solve_pc(s.viscous(kk), s.pc_filter(kk) * Dk, alpha)
    b_l = _long_wave(s, k, U, om, us)
    d = eckv_delta(k, U, om, us, s.kgam, s.cm, s.g)
    if phi is None:
        lw = b_l[..., None] * (1.0 + d[..., None] * np.cos(2.0 * P)) / (2.0 * np.pi)
    else:
        lw = b_l * (1.0 + d * np.cos(2.0 * P)) / (2.0 * np.pi)
    return lw + (1.0 - _join_weight(kk, kpx, omx)) * (bw + bpc)


def solve_for(f, phi=None):
    """B(k, phi) [rad-1] of the model for a resolved Forcing ``f`` (internal).

    Returns B on the internal half-circle grid (trailing axis of N_PHI) when ``phi`` is
    None, else at the given directions [rad] (broadcast with ``f.k``).
    """
    k = np.asarray(f.k, dtype=float)
    U = np.asarray(f.wind_speed, dtype=float)
    om = np.asarray(f.omega, dtype=float)
    us = np.asarray(f.ustar, dtype=float)
    if phi is not None:
        k, U, om, us, phi = np.broadcast_arrays(k, U, om, us, phi)
    else:
        k, U, om, us = np.broadcast_arrays(k, U, om, us)
    # forcing rows: unique (U, Omega, u*) triples
    trip = np.stack([U.ravel(), om.ravel(), us.ravel()], -1)
    nanrow = np.any(np.isnan(trip), -1)
    trip_ok = np.where(nanrow[:, None], [10.0, 0.84, 0.38], trip)
    uniq, inv = np.unique(trip_ok, axis=0, return_inverse=True)
    inv = inv.ravel()

    class _F:
        pass
    g = _F()
    g.wind_speed, g.omega, g.ustar = uniq[:, 0], uniq[:, 1], uniq[:, 2]
    g.water, g.gravity = f.water, f.gravity
    st = yurovskaya2013_state(g)
    kr = k.ravel()
    if phi is None:
        b = _evaluate(st, kr, inv)
        b = np.where(nanrow[:, None], np.nan, b)
        return b.reshape(k.shape + (N_PHI,)), st.phi
    b = _evaluate(st, kr, inv, phi.ravel())
    return np.where(nanrow, np.nan, b).reshape(k.shape), None


def omni_and_delta(f, want_delta=True):
    """Omnidirectional B(k) and the second harmonic Delta(k) (internal)."""
    b, phi = solve_for(f)
    w = np.full(N_PHI, phi[1] - phi[0])
    w[[0, -1]] *= 0.5
    w *= 2.0                                                    # full circle by symmetry
    omni = np.sum(b * w, -1)
    if not want_delta:
        return omni, None
    harm = 2.0 * np.sum(b * np.cos(2.0 * phi) * w, -1)
    pos = omni > 0
    # where B underflows to 0 (far below the peak) use the long-wave (ECKV) spreading
    s = _Setup(f)
    d_long = eckv_delta(f.k, f.wind_speed, f.omega, f.ustar, s.kgam, s.cm, s.g)
    return omni, np.where(pos, harm / np.where(pos, omni, 1.0), d_long)


def yurovskaya2013_directional_curvature(f, phi_rad, centrosymmetric=True):
    """Directional curvature B(k, phi) [rad-1]; folded (B(phi) + B(phi+pi))/2 by default."""
    if centrosymmetric:
        b1, _ = solve_for(f, phi_rad)
        b2, _ = solve_for(f, np.asarray(phi_rad) + np.pi)
        return 0.5 * (b1 + b2)
    b, _ = solve_for(f, phi_rad)
    return b


def yurovskaya2013(k, wind_speed, inverse_wave_age=0.84, fetch=None, water=None, *,
                   friction_velocity=None, ustar_law="constant-drag", nan_policy="raise"):
    """Omnidirectional spectrum of the energy-balance short-wave model (Yurovskaya et al. 2013).

    Kudryavtsev et al. (1999, 2003) short-wave spectrum in the 2013 revision, joined to the
    Elfouhaily et al. (1997) long-wave part; see the module docstring for the equations,
    their provenance and which parts are interpretations.

    Parameters
    ----------
    k : numeric
        Wavenumber [rad m-1], > 0 (broadcast with the other inputs).
    wind_speed : numeric
        U10 [m s-1], > 0.
    inverse_wave_age : numeric
        Omega = U10/c_p [1] of the long-wave part, 0.84-5 (warning outside).
    fetch : numeric, optional
        Fetch [m]; replaces Omega (ECKV Eq. 37).
    water : Water or Liquid, optional
        Surface tension, density and kinematic viscosity (default sea water 15 degC,
        35 g/kg): they set k_gamma = sqrt(g rho/sigma), the viscous damping 4 nu k^2/omega
        and so the capillary cut-off.
    friction_velocity : numeric, optional
        u* [m s-1]; overrides ``ustar_law`` (default ``"constant-drag"``, C_D = 1.44e-3).
    nan_policy : {"raise", "propagate"}
        NaN wind speeds: error, or NaN spectra.

    Returns
    -------
    numeric
        S(k) [m3], one-sided omnidirectional.

    Notes
    -----
    B(k, phi) = B_l(k) D_ECKV(k, phi) + (1 - w) [B_w(k, phi) + B_pc(k, phi)] (ATBD C1,
    C13); B_w from beta_nu B - B (B/alpha)^n + Q_b^w = 0 (C9) with
    beta = 1.2e-3 (1 + cos^2 phi) u* (U_k cos phi - c)/c^2 (C10),
    Q_b^w = 4.5e-3 omega^-1 integral over k' < min(k/10, k_b) of omega' beta B d ln k' dphi'
    (C12), 1/n = 0.9 f(k/k_b) + 0.1, alpha = 2e-3 * 0.03^(-1/n), f(x) = x^4/(1 + x^4)
    (C20-C22); B_pc from the n = 1 balance fed by the dissipation of breaking waves at
    k_gamma^2/k, filtered by f(k/1.5k_gamma) - f(k/4k_gamma) (C11, C19, C23).
    Solved on an internal grid (50 points per decade from k_p/8 to 3e4 rad m-1, 73
    directions on a half circle) by fixed-point iteration of the breaking source and
    Newton's method for the local balance, then evaluated at ``k``; omnidirectional
    values accurate to about 0.5 % (see the module docstring, Numerics).

    Examples
    --------
    >>> round(float(yurovskaya2013(370.0, 10.0) * 370.0**3), 4)   # curvature near k_gamma
    0.0045
    """
    from .core import omnidirectional
    return omnidirectional(k, wind_speed, "yurovskaya2013", inverse_wave_age, fetch, water,
                           friction_velocity=friction_velocity, ustar_law=ustar_law,
                           nan_policy=nan_policy)
