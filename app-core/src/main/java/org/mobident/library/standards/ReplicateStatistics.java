package org.mobident.library.standards;

/**
 * Mean, sample standard deviation and their pooling.
 *
 * <p>Mean and sum of squared deviations M2 are accumulated with Welford's update (Welford,
 * Technometrics 4 (1962) 419, from memory); two summaries are combined with the parallel formula of Chan,
 * Golub &amp; LeVeque (1979, "Updating formulae and a pairwise algorithm for computing sample
 * variances", Stanford CS report STAN-CS-79-773, report number from memory; see also Chan, Golub &amp; LeVeque,
 * The American Statistician 37 (1983) 242):
 * n = n₁ + n₂, δ = m₂ − m₁, m = m₁ + δ·n₂/n, M2 = M2₁ + M2₂ + δ²·n₁n₂/n, s = √(M2/(n − 1)).
 * The result equals the summary of all values at once.
 *
 * @param n    number of values
 * @param mean their mean (NaN when n = 0)
 * @param m2   sum of squared deviations from the mean (0 when n ≤ 1)
 */
public record ReplicateStatistics(int n, double mean, double m2) {

    /** The summary of no values. */
    public static final ReplicateStatistics EMPTY = new ReplicateStatistics(0, Double.NaN, 0.0);

    /** Summary of the given values (Welford's update). */
    public static ReplicateStatistics of(double[] values) {
        int n = 0;
        double mean = 0;
        double m2 = 0;
        for (double x : values) {
            n++;
            double d = x - mean;
            mean += d / n;
            m2 += d * (x - mean);
        }
        return n == 0 ? EMPTY : new ReplicateStatistics(n, mean, m2);
    }

    /** Summary from a published mean, SD and n: M2 = SD²·(n − 1) (SD may be NaN when n = 1). */
    public static ReplicateStatistics fromMeanSd(int n, double mean, double sd) {
        if (n < 1) {
            throw new IllegalArgumentException("n must be at least 1, got " + n);
        }
        return new ReplicateStatistics(n, mean, n == 1 ? 0.0 : sd * sd * (n - 1));
    }

    /** The summary of both samples together (Chan, Golub &amp; LeVeque 1979). */
    public ReplicateStatistics combine(ReplicateStatistics other) {
        if (other.n == 0) {
            return this;
        }
        if (n == 0) {
            return other;
        }
        int total = n + other.n;
        double delta = other.mean - mean;
        double combinedMean = mean + delta * other.n / total;
        double combinedM2 = m2 + other.m2 + delta * delta * ((double) n * other.n / total);
        return new ReplicateStatistics(total, combinedMean, combinedM2);
    }

    /** Sample standard deviation √(M2/(n − 1)); NaN when n &lt; 2. */
    public double sd() {
        return n < 2 ? Double.NaN : Math.sqrt(m2 / (n - 1));
    }

    /** Relative standard deviation 100·s/|m|, %; NaN when undefined. */
    public double rsdPercent() {
        double sd = sd();
        return Double.isNaN(sd) || mean == 0 ? Double.NaN : 100.0 * sd / Math.abs(mean);
    }

    static double mean(double[] values) {
        return of(values).mean;
    }

    static double sampleSd(double[] values) {
        return of(values).sd();
    }
}
