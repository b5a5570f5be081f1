package dev.proofrun.grade;

import java.util.Locale;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.distribution.continuous.NormalDistribution;

/**
 * Maximum-likelihood fits of the alternatives to the normal model, for positive readings x₁..x_N.
 *
 * <ul>
 * <li><b>Box–Cox</b> (Box &amp; Cox 1964, JRSS B 26:211–252): y = (x^λ − 1)/λ, y = ln x for λ = 0. λ maximizes
 *     the profile log-likelihood ℓ(λ) = −(N/2)·ln σ̂²(λ) + (λ − 1)·Σ ln xᵢ, σ̂² the variance of the y with
 *     divisor N; found by golden-section search on [−5, 5] to 1e−9 (ℓ is unimodal in practice; SciPy's
 *     {@code boxcox_normmax(method='mle')} maximizes the same function).</li>
 * <li><b>Lognormal</b>: μ = mean of ln x, σ² = mean of (ln x − μ)² (divisor N): the closed-form MLE.</li>
 * <li><b>Weibull</b> (two parameters, location 0): the shape k solves
 *     Σ xᵏ ln x / Σ xᵏ − 1/k − mean(ln x) = 0 (Brent's method from 0.01 up to a widened upper end); scale c = (mean xᵏ)^(1/k).</li>
 * </ul>
 * Log-likelihoods are of the readings on their original scale (the Jacobian of a transform included), so
 * models can be compared by AIC.
 */
final class DistributionFits {

    static final double LAMBDA_LOW = -5;
    static final double LAMBDA_HIGH = 5;
    private static final double GOLDEN = (Math.sqrt(5) - 1) / 2;
    private static final double LN_2PI = Math.log(2 * Math.PI);

    private DistributionFits() {
    }

    /** True when every reading is positive (the alternatives need it). */
    static boolean allPositive(double[] x) {
        for (double v : x) {
            if (!(v > 0)) {
                return false;
            }
        }
        return true;
    }

    /** The Box–Cox transform of one value. */
    static double boxCox(double x, double lambda) {
        return lambda == 0 ? Math.log(x) : (Math.pow(x, lambda) - 1) / lambda;
    }

    /**
     * λ by maximum likelihood.
     *
     * @throws IllegalArgumentException if a reading is not positive or there are fewer than 3
     */
    static double boxCoxLambda(double[] x) {
        require(x);
        double[] logs = logs(x);
        double a = LAMBDA_LOW;
        double b = LAMBDA_HIGH;
        double c = b - GOLDEN * (b - a);
        double d = a + GOLDEN * (b - a);
        double fc = boxCoxProfile(logs, c);
        double fd = boxCoxProfile(logs, d);
        while (b - a > 1e-9) {
            if (fc > fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - GOLDEN * (b - a);
                fc = boxCoxProfile(logs, c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + GOLDEN * (b - a);
                fd = boxCoxProfile(logs, d);
            }
        }
        return (a + b) / 2;
    }

    /** ℓ(λ) without constants: −(N/2)·ln σ̂²(λ) + (λ − 1)·Σ ln x. */
    static double boxCoxProfile(double[] logs, double lambda) {
        int n = logs.length;
        double sum = 0;
        double sumLog = 0;
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = lambda == 0 ? logs[i] : Math.expm1(lambda * logs[i]) / lambda;
            sum += y[i];
            sumLog += logs[i];
        }
        double mean = sum / n;
        double ss = 0;
        for (double v : y) {
            ss += (v - mean) * (v - mean);
        }
        return -0.5 * n * Math.log(ss / n) + (lambda - 1) * sumLog;
    }

    /** The full Box–Cox log-likelihood of the readings at λ (normal on the transformed scale, Jacobian included). */
    static double boxCoxLogLikelihood(double[] x, double lambda) {
        int n = x.length;
        return boxCoxProfile(logs(x), lambda) - 0.5 * n * (LN_2PI + 1);
    }

    /** {μ, σ, logL} of the lognormal MLE. */
    static double[] lognormal(double[] x) {
        require(x);
        double[] logs = logs(x);
        int n = x.length;
        double sum = sum(logs);
        double mu = sum / n;
        double var = squaredDeviations(logs, mu) / n;
        double logL = -0.5 * n * (LN_2PI + Math.log(var) + 1) - sum;
        return new double[] {mu, Math.sqrt(var), logL};
    }

    /** {shape k, scale c, logL} of the two-parameter Weibull MLE. */
    static double[] weibull(double[] x) {
        require(x);
        double[] logs = logs(x);
        int n = x.length;
        double meanLog = 0;
        double maxLog = Double.NEGATIVE_INFINITY;
        for (double v : logs) {
            meanLog += v;
            maxLog = Math.max(maxLog, v);
        }
        meanLog /= n;
        final double mLog = meanLog;
        final double shift = maxLog;
        // scaled by exp(-k·max ln x) against overflow; the ratio is unchanged
        org.hipparchus.analysis.UnivariateFunction score = kk -> {
            double s0 = 0;
            double s1 = 0;
            for (double lv : logs) {
                double w = Math.exp(kk * (lv - shift));
                s0 += w;
                s1 += w * lv;
            }
            return s1 / s0 - 1 / kk - mLog;
        };
        // the score rises from -inf (k -> 0) to max ln x - mean ln x > 0 (k -> inf): widen until it brackets
        double hi = 16;
        while (score.value(hi) < 0 && hi < 1e7) {
            hi *= 4;
        }
        BrentSolver solver = new BrentSolver(1e-12, 1e-12);
        double k = solver.solve(1000, score, 0.01, hi);
        double s0 = 0;
        for (double lv : logs) {
            s0 += Math.exp(k * (lv - shift));
        }
        // c = (mean x^k)^(1/k) = exp(shift) · (s0/n)^(1/k)
        double c = Math.exp(shift + Math.log(s0 / n) / k);
        double logL = 0;
        for (int i = 0; i < n; i++) {
            double z = Math.exp(k * (logs[i] - Math.log(c)));
            logL += Math.log(k) - Math.log(c) + (k - 1) * (logs[i] - Math.log(c)) - z;
        }
        return new double[] {k, c, logL};
    }

    /** {mean, s (MLE divisor N), logL} of the normal MLE. */
    static double[] normal(double[] x) {
        int n = x.length;
        double mean = sum(x) / n;
        double var = squaredDeviations(x, mean) / n;
        return new double[] {mean, Math.sqrt(var), -0.5 * n * (LN_2PI + Math.log(var) + 1)};
    }

    /** The p-quantile of a Weibull(k, c): c·(−ln(1−p))^(1/k). */
    static double weibullQuantile(double k, double c, double p) {
        return c * Math.pow(-Math.log1p(-p), 1 / k);
    }

    /** The p-quantile of a lognormal(μ, σ). */
    static double lognormalQuantile(double mu, double sigma, double p) {
        return Math.exp(mu + sigma * new NormalDistribution(0, 1).inverseCumulativeProbability(p));
    }

    /** Σ vᵢ, added in index order (the fits and the shape step's normality test add alike). */
    static double sum(double[] v) {
        double sum = 0;
        for (double d : v) {
            sum += d;
        }
        return sum;
    }

    /** Σ (vᵢ − mean)², added in index order: the second pass of a two-pass variance. */
    static double squaredDeviations(double[] v, double mean) {
        double ss = 0;
        for (double d : v) {
            ss += (d - mean) * (d - mean);
        }
        return ss;
    }

    /** ln xᵢ of every reading (a new array). */
    static double[] logs(double[] x) {
        double[] l = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            l[i] = Math.log(x[i]);
        }
        return l;
    }

    private static void require(double[] x) {
        if (x.length < 3) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "at least 3 readings are needed: %d", x.length));
        }
        for (double v : x) {
            if (!(v > 0) || !Double.isFinite(v)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "readings must be positive and finite: %s", v));
            }
        }
    }
}
