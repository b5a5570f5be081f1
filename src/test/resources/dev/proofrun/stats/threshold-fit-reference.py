# Reference values for ThresholdFitTest: fits with the location (threshold) held at its declared value.
# Run: python3 threshold-fit-reference.py (SciPy 1.10.1, NumPy from Debian 12 python3-scipy); the output is copied into the test.
import numpy as np, scipy
from scipy import stats
from scipy.optimize import brentq
x = np.array([9.9712, 9.9655, 9.9831, 9.9598, 9.9704, 9.9923, 9.9667, 9.9750, 9.9581, 9.9689, 10.0046, 9.9736])
theta = 9.95; usl = 10.10
lo, hi = stats.norm.cdf(-3), stats.norm.cdf(3)   # the percentile method's 0.135 % and 99.865 %
print("scipy", scipy.__version__)
s, loc, scale = stats.lognorm.fit(x, floc=theta)
print("lognorm.fit(x, floc=9.95): s=%r scale=%r mu=%r" % (s, scale, np.log(scale)))
q = [stats.lognorm.ppf(p, s, loc=theta, scale=scale) for p in (lo, 0.5, hi)]
print("lognorm.ppf:", q, "Ppu", (usl - q[1]) / (q[2] - q[1]), "sf(usl)", stats.lognorm.sf(usl, s, loc=theta, scale=scale))
c, loc, sc = stats.weibull_min.fit(x, floc=theta)
print("weibull_min.fit(x, floc=9.95): c=%r scale=%r" % (c, sc))
# SciPy's optimizer stops near 1e-5; the root of the profile score, solved to full precision, for a tight check
y = x - theta
k = brentq(lambda k: ((y**k) * np.log(y)).sum() / (y**k).sum() - 1 / k - np.log(y).mean(), 0.1, 50, xtol=1e-15, rtol=1e-15)
lam = ((y**k).mean()) ** (1 / k)
print("brentq of the score: k=%r scale=%r" % (k, lam))
q = [stats.weibull_min.ppf(p, k, loc=theta, scale=lam) for p in (lo, 0.5, hi)]
print("weibull_min.ppf(k, scale from brentq):", q, "Ppu", (usl - q[1]) / (q[2] - q[1]))
