package dev.proofrun.stats;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.sampling.distribution.ZigguratSampler;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

/**
 * The Weibull maximum-likelihood solver ({@link ShapeFitter#solveShape}, Halley's method with the log-sum carried to
 * the root) against SciPy 1.17.1 / NumPy 2.4.6 on samples far from the standard start (a heavy shape near 0.55, a
 * narrow one near 9, three readings), and against a plain bisection of the same score equation on seeded samples.
 * The samples were drawn once with numpy.random.default_rng(20261203): A = round(0.8*weibull(0.7, 12), 4),
 * B = round(25*weibull(8, 12), 3); C is invented.
 */
class WeibullSolverTest {

    static final double[] A = {1.2119, 5.1629, 0.0415, 0.4961, 1.714, 0.0002, 0.0069, 4.5522, 0.4441, 1.8864, 0.6309,
        0.3236};
    static final double[] B = {22.53, 20.943, 21.861, 25.756, 17.905, 27.151, 21.151, 22.404, 17.263, 25.133, 25.243,
        22.456};
    static final double[] C = {0.5, 1.0, 4.0};

    // k = scipy.optimize.brentq(score, 0.05, 100, xtol=1e-14) with
    // score(k) = sum(x**k*log x)/sum(x**k) - 1/k - mean(log x), c = mean(x**k)**(1/k); and
    // scipy.stats.weibull_min.fit(x, floc=0) -> (k, 0, c), whose general optimizer stops a little short of the root
    @Test
    void heavyShapeAsSciPy() {
        // brentq: k = 0.5470437446921871, c = 0.9258701928034464; weibull_min.fit: 0.5470371194121864, 0.9258866920475439
        check(A, 0.5470437446921871, 0.9258701928034464, 0.5470371194121864, 0.9258866920475439);
    }

    @Test
    void narrowShapeAsSciPy() {
        // brentq: k = 9.068090092189726, c = 23.7379143980791; weibull_min.fit: 9.068057680877267, 23.73791684024244
        check(B, 9.068090092189726, 23.7379143980791, 9.068057680877267, 23.73791684024244);
    }

    @Test
    void threeReadingsAsSciPy() {
        // brentq: k = 1.2171700366847091, c = 1.9670975048874533; weibull_min.fit: 1.2171536698798353, 1.967107807174272
        check(C, 1.2171700366847091, 1.9670975048874533, 1.2171536698798353, 1.967107807174272);
    }

    private static void check(double[] x, double k, double c, double fitK, double fitC) {
        ShapeFit f = ShapeFitter.fit(ShapeFamily.WEIBULL, x).fit();
        assertEquals(k, f.first(), 1e-10 * k);
        assertEquals(c, f.second(), 1e-10 * c);
        assertEquals(fitK, f.first(), 1e-4 * k);
        assertEquals(fitC, f.second(), 1e-4 * c);
    }

    /** The root and log-sum agree with a bisection of the score to 60 halvings, for N from 3 to 400. */
    @Test
    void agreesWithBisectionOnSeededSamples() {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(20261203L);
        ZigguratSampler.Exponential e = ZigguratSampler.Exponential.of(rng);
        double worst = 0;
        for (int n : new int[] {3, 4, 7, 15, 40, 125, 400}) {
            for (int rep = 0; rep < 60; rep++) {
                double[] y = new double[n];
                for (int i = 0; i < n; i++) {
                    y[i] = Math.log(e.sample()) * (0.3 + rep % 5); // Weibull shapes 1/0.3 … 1/4.3 on ln x
                }
                double[] ms = ShapeFitter.meanSd(y);
                double zMax = Arrays.stream(y).map(v -> (v - ms[0]) / ms[1]).max().getAsDouble();
                double[] d = Arrays.stream(y).map(v -> (v - ms[0]) / ms[1] - zMax).toArray();
                double[] got = ShapeFitter.solveShape(d, zMax);
                double lo = ShapeFitter.K_LOW;
                double hi = ShapeFitter.K_HIGH;
                for (int it = 0; it < 200 && hi - lo > 1e-15 * hi; it++) {
                    double mid = 0.5 * (lo + hi);
                    if (score(d, zMax, mid) < 0) {
                        lo = mid;
                    } else {
                        hi = mid;
                    }
                }
                double k = 0.5 * (lo + hi);
                double logSum = Math.log(Arrays.stream(d).map(v -> Math.exp(k * v)).sum());
                worst = Math.max(worst, Math.abs(got[0] - k) / k);
                assertEquals(k, got[0], 1e-11 * k, () -> "N = " + n);
                assertEquals(logSum, got[1], 1e-11 * Math.max(1, Math.abs(logSum)), () -> "N = " + n);
            }
        }
        assertTrue(worst < 1e-11);
    }

    private static double score(double[] d, double zMax, double k) {
        double s0 = 0;
        double s1 = 0;
        for (double v : d) {
            double w = Math.exp(k * v);
            s0 += w;
            s1 += w * v;
        }
        return s1 / s0 + zMax - 1 / k;
    }
}
