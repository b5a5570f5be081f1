"""Independent reference values for dev.proofrun.design tests (SciPy 1.17.1, NumPy 2.4.6, Python 3.11).

Run: python3 reference_sizes.py   -- prints the values pasted into DesignReferenceTest.

1. Pp (overall s, nu = N - 1, n = 1, no floors): the smallest N with
   chi2.cdf(chi2.ppf(alpha, N-1) * (c1/c0)**2, N-1) >= power   (Kane 1986's test on Cp, exact chi-square).
2. Ppu (one-sided, nu = N - 1): t* = nct.ppf(1-alpha, N-1, 3*sqrt(N)*c0); power = nct.sf(t*, N-1, 3*sqrt(N)*c1);
   the smallest N reaching the power.
3. Two-sided Ppk, exact bound holding the observed relative offset fixed: power at a fixed N by
   scipy.integrate.quad (tail integral), scipy.optimize.brentq (critical estimate at each observed offset)
   and an outer quad over the mean.
"""
import numpy as np
from scipy import stats, integrate, optimize

def pp_size(c0, c1, conf, power):
    a = 1 - conf
    for N in range(3, 20000):
        nu = N - 1
        if stats.chi2.cdf(stats.chi2.ppf(a, nu) * (c1 / c0) ** 2, nu) >= power:
            return N

def ppu_size(c0, c1, conf, power):
    a = 1 - conf
    for N in range(3, 20000):
        nu = N - 1
        r = 3 * np.sqrt(N)
        t = stats.nct.ppf(1 - a, nu, r * c0)
        if stats.nct.sf(t, nu, r * c1) >= power:
            return N

def w_pdf(w, nu):
    return stats.chi.pdf(w * np.sqrt(nu), nu) * np.sqrt(nu)

def cpk_tail(c, L, cp, N, nu):
    rn = np.sqrt(N)
    def f(w):
        return (stats.norm.cdf(rn * (3 * L - 3 * c * w)) - stats.norm.cdf(rn * (3 * c * w + 3 * L - 6 * cp))) * w_pdf(w, nu)
    hi = cp / c
    lo = max(1e-9, 1 - 12 / np.sqrt(2 * nu))
    return integrate.quad(f, lo, hi, points=[L / c], epsabs=1e-13, epsrel=1e-11, limit=200)[0]

def critical(k, c0, N, nu, a):
    cp = c0 / (1 - k)
    return optimize.brentq(lambda c: cpk_tail(c, c0, cp, N, nu) - a, c0 * 1.0001, c0 * 2, xtol=1e-12)

def ppk_power(c0, c1, cp1, conf, N):
    nu = N - 1
    a = 1 - conf
    rn = np.sqrt(N)
    centre = 3 * (cp1 - c1)
    def g(z):
        k = abs(z) / (3 * cp1)
        cs = critical(k, c0, N, nu, a)
        wmax = (3 * cp1 - abs(z)) / (3 * cs)
        return stats.norm.pdf(rn * (z - centre)) * rn * stats.chi2.cdf(nu * wmax * wmax, nu)
    lo, hi = centre - 8 / rn, centre + 8 / rn
    pts = [0.0] if lo < 0 < hi else None
    return integrate.quad(g, lo, hi, points=pts, epsabs=1e-9, limit=100)[0]

if __name__ == "__main__":
    for c0, c1, conf, p in [(1.0, 1.33, 0.95, 0.90), (1.33, 1.67, 0.95, 0.90), (1.33, 1.67, 0.95, 0.95),
                            (1.33, 2.0, 0.99, 0.90), (1.67, 2.0, 0.95, 0.80)]:
        print("Pp ", c0, c1, conf, p, "N =", pp_size(c0, c1, conf, p))
    for c0, c1, conf, p in [(1.0, 1.33, 0.95, 0.90), (1.33, 1.67, 0.95, 0.90), (1.33, 1.67, 0.99, 0.90)]:
        print("Ppu", c0, c1, conf, p, "N =", ppu_size(c0, c1, conf, p))
    for c0, c1, cp1, N in [(1.33, 1.67, 1.67, 100), (1.33, 1.67, 2.0, 100), (1.0, 1.33, 1.33, 60)]:
        print("Ppk power", c0, c1, cp1, N, "%.6f" % ppk_power(c0, c1, cp1, 0.95, N))

# 4. Kane (1986, JQT 18:41-52), the test on Cp: reject Cp <= Cp(low) when Cp^ > C, with
#    C = Cp(low) * sqrt(nu / chi2.ppf(alpha, nu)), nu = n - 1, and power P(chi2_nu < chi2.ppf(alpha, nu) * r**2)
#    at Cp(high) = r * Cp(low). Evaluated here from that formula (the same as pp_size); this is NOT his printed
#    table, which was not available to check against.
def kane_row(r, alpha, beta):
    n = pp_size(1.0, r, 1 - alpha, 1 - beta)
    nu = n - 1
    return n, np.sqrt(nu / stats.chi2.ppf(alpha, nu))

if __name__ == "__main__":
    for a in (0.05, 0.10):
        for r in (1.10, 1.15, 1.20, 1.25, 1.30, 1.35, 1.40, 1.45, 1.50):
            n, c = kane_row(r, a, a)
            print("Kane formula alpha = beta = %.2f, ratio %.2f: n = %d, C/Cp(low) = %.6f" % (a, r, n, c))
