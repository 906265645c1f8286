package org.mobident.summary;

import java.util.List;

/** Mean, sample SD and the least-squares slope with its standard error, for the batch summaries. */
final class Stats {
    private Stats() {
    }

    /** The arithmetic mean, NaN for no values. */
    static double mean(List<Double> v) {
        if (v.isEmpty()) {
            return Double.NaN;
        }
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.size();
    }

    /** The sample standard deviation (n − 1), NaN below two values. */
    static double sd(List<Double> v) {
        if (v.size() < 2) {
            return Double.NaN;
        }
        double m = mean(v);
        double ss = 0;
        for (double x : v) {
            ss += (x - m) * (x - m);
        }
        return Math.sqrt(ss / (v.size() - 1));
    }

    /**
     * The ordinary least-squares slope of y on x and its standard error s/√Sxx with
     * s² = Σ residual² / (n − 2): {slope, se}. The slope is NaN below two points or when all x
     * are equal; the error is NaN below three points.
     */
    static double[] slope(List<Double> x, List<Double> y) {
        int n = x.size();
        if (n < 2) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double mx = mean(x);
        double my = mean(y);
        double sxx = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            sxx += (x.get(i) - mx) * (x.get(i) - mx);
            sxy += (x.get(i) - mx) * (y.get(i) - my);
        }
        if (!(sxx > 0)) {
            return new double[] {Double.NaN, Double.NaN};
        }
        double b = sxy / sxx;
        if (n < 3) {
            return new double[] {b, Double.NaN};
        }
        double rss = 0;
        for (int i = 0; i < n; i++) {
            double r = y.get(i) - my - b * (x.get(i) - mx);
            rss += r * r;
        }
        return new double[] {b, Math.sqrt(rss / (n - 2) / sxx)};
    }
}
