package org.mobident.signal;

import java.util.Random;
import org.mobident.trace.Trace;

/** Synthetic electropherograms for the tests: Gaussian zones, drift, white noise, fixed seeds. */
final class Synthetic {

    private Synthetic() {
    }

    /** Equally spaced times from {@code startS}, {@code count} points, step {@code stepS}. */
    static double[] regularTimes(double startS, double stepS, int count) {
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = startS + i * stepS;
        }
        return t;
    }

    /** Times with steps drawn uniformly in [(1 − jitter) step, (1 + jitter) step]. */
    static double[] jitteredTimes(double startS, double stepS, int count, double jitter, long seed) {
        Random random = new Random(seed);
        double[] t = new double[count];
        t[0] = startS;
        for (int i = 1; i < count; i++) {
            t[i] = t[i - 1] + stepS * (1 + jitter * (2 * random.nextDouble() - 1));
        }
        return t;
    }

    /** Adds a Gaussian H·exp(−(t − t0)²/(2σ²)) to {@code y}. */
    static void addGaussian(double[] t, double[] y, double apexS, double height, double sigmaS) {
        for (int i = 0; i < t.length; i++) {
            double z = (t[i] - apexS) / sigmaS;
            y[i] += height * Math.exp(-0.5 * z * z);
        }
    }

    /**
     * Adds a Gaussian (SD {@code sigmaS}, centre {@code centreS}) convolved with an exponential
     * decay of time constant {@code tauS} (the exponentially modified Gaussian, Grushka, Anal.
     * Chem. 44 (1972) 1733), scaled to the given apex height; the convolution is summed
     * numerically over 12 τ in steps of τ/200.
     */
    static void addTailedZone(double[] t, double[] y, double centreS, double height, double sigmaS, double tauS) {
        double step = tauS / 200;
        double[] v = new double[t.length];
        double max = 0;
        for (int i = 0; i < t.length; i++) {
            double x = t[i] - centreS;
            if (x < -8 * sigmaS || x > 8 * sigmaS + 12 * tauS) {
                continue;
            }
            double s = 0;
            for (double u = 0; u < 12 * tauS; u += step) {
                double z = (x - u) / sigmaS;
                s += Math.exp(-0.5 * z * z - u / tauS);
            }
            v[i] = s;
            max = Math.max(max, s);
        }
        for (int i = 0; i < t.length; i++) {
            y[i] += height * v[i] / max;
        }
    }

    /** Adds white Gaussian noise of SD {@code sd}. */
    static void addNoise(double[] y, double sd, long seed) {
        Random random = new Random(seed);
        for (int i = 0; i < y.length; i++) {
            y[i] += sd * random.nextGaussian();
        }
    }

    /**
     * Adds a stationary first-order autoregressive series e_i = φ e_{i−1} + a_i of marginal SD
     * {@code sd} (innovations of SD sd·√(1 − φ²), e_0 drawn from the marginal distribution; Box &amp;
     * Jenkins, Time Series Analysis, 1970, ch. 3: Var(e) = σ_a²/(1 − φ²)).
     */
    static void addCorrelatedNoise(double[] y, double sd, double phi, long seed) {
        Random random = new Random(seed);
        double innovation = sd * Math.sqrt(1 - phi * phi);
        double e = sd * random.nextGaussian();
        for (int i = 0; i < y.length; i++) {
            if (i > 0) {
                e = phi * e + innovation * random.nextGaussian();
            }
            y[i] += e;
        }
    }

    /** Adds a spike of {@code amplitude} to {@code width} samples from index {@code first}. */
    static void addSpike(double[] y, int first, int width, double amplitude) {
        for (int k = 0; k < width; k++) {
            y[first + k] += amplitude;
        }
    }

    /** Adds {@code a + b t + c t²}. */
    static void addDrift(double[] t, double[] y, double a, double b, double c) {
        for (int i = 0; i < t.length; i++) {
            y[i] += a + b * t[i] + c * t[i] * t[i];
        }
    }

    static Trace trace(double[] t, double[] y) {
        return new Trace("synthetic", "synthetic.csv", t, y);
    }
}
