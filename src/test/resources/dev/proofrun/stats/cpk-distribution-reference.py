# Reference values for dev.proofrun.stats.IndexDistribution.cpkAtLeast (printed as CSV rows).
# Run: python3 cpk-distribution-reference.py      (Python 3.11, mpmath 1.3.0, 30 digits)
#
# P(Cpk^ >= c) with Cpk^ = (3Cp - |D|)/(3W), D ~ N(b, 1/N), b = 3(Cp - Cpk), W = sqrt(chi2_nu/nu).
# Integrated in the other order from the Java code (which conditions on W): condition on D,
#     P = int_{-3Cp}^{3Cp} phi(D; b, 1/N) * P(W <= (3Cp - |D|)/(3c)) dD        (c > 0)
# with P(W <= w) = gammainc(nu/2, 0, nu*w^2/2, regularized=True).
import mpmath as mp

mp.mp.dps = 30


def cpk_at_least(c, cpk, cp, n, nu):
    c, cpk, cp, nu = mp.mpf(c), mp.mpf(cpk), mp.mpf(cp), mp.mpf(nu)
    b = 3 * (cp - cpk)
    sd = 1 / mp.sqrt(n)
    def integrand(d):
        w = (3 * cp - abs(d)) / (3 * c)
        return mp.npdf(d, b, sd) * mp.gammainc(nu / 2, 0, nu * w * w / 2, regularized=True)
    pts = sorted({-3 * cp, mp.mpf(0), 3 * cp} | {b + k * sd for k in (-10, -5, -2, 0, 2, 5, 10) if -3 * cp < b + k * sd < 3 * cp})
    return mp.quad(integrand, pts)


cases = [
    (1.2, 1.33, 1.5, 100, 99), (1.33, 1.33, 1.33, 30, 29), (1.5, 1.67, 2.17, 300, 299),
    (1.0, 1.33, 1.33, 20, 19), (1.1, 1.0, 1.2, 50, 41.7), (0.9, 1.0, 1.0, 10, 9),
    (1.6, 1.33, 1.83, 125, 110.5), (0.5, 0.3, 1.5, 30, 29), (2.0, 2.0, 2.5, 1000, 999),
    (0.2, 1.0, 1.0, 5, 3.6), (1.4, 1.33, 1.33, 200, 180.2), (1.0, 1.2, 4.0, 40, 39),
]
print("# mpmath %s, cpk-distribution-reference.py" % mp.__version__)
print("# c, trueCpk, trueCp, n, nu, P(Cpk^ >= c)")
for case in cases:
    print('"%s, %s, %s, %s, %s, %s",' % (case + (mp.nstr(cpk_at_least(*case), 20),)))
