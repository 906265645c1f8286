package org.mobident.signal;

import org.apache.commons.numbers.gamma.Erfc;
import org.apache.commons.numbers.gamma.Erfcx;

/**
 * The two forms a skewed zone is fitted with, as unit-area functions of x, the distance behind the
 * zone's sharp side along its skew direction, its Gaussian SD σ and its size a, the distance from
 * the sharp side to the first moment. Electromigration dispersion gives a concentrated zone a sharp
 * and a diffuse flank (Mikkers, Everaerts &amp; Verheggen, J. Chromatogr. 169 (1979) 1): mildly
 * overloaded zones look like an exponentially modified Gaussian, strongly overloaded ones like a
 * triangle smoothed by diffusion. A detector that knew only one form would follow the other with
 * an extra zone. The one place where both forms and their derivatives are written.
 */
enum ZoneForm {

    /**
     * Exponentially modified Gaussian (Grushka, Anal. Chem. 44 (1972) 1733), a = τ:
     * {@code g = 1/(2a) · exp(σ²/(2a²) − x/a) · erfc((σ/a − x/σ)/√2)}, evaluated where the erfc
     * argument z is not negative as {@code exp(−x²/(2σ²)) · erfcx(z)/(2a)}, which neither
     * overflows nor underflows. With φ the normal density of SD σ at x: ∂g/∂x = (φ − g)/a,
     * ∂g/∂σ = (σ/a²)(g − φ) − φx/(σa), ∂g/∂a = g(x/a² − 1/a − σ²/a³) + φσ²/a³ (differentiated
     * here from the definition).
     */
    EXPONENTIAL(1.0, 2.0) {
        @Override
        double value(double x, double sigma, double a) {
            double z = (sigma / a - x / sigma) / SQRT_2;
            if (z >= 0) {
                return Math.exp(-0.5 * (x / sigma) * (x / sigma)) * Erfcx.value(z) / (2 * a);
            }
            return Math.exp(0.5 * (sigma / a) * (sigma / a) - x / a) * Erfc.value(z) / (2 * a);
        }

        @Override
        void evaluate(double x, double sigma, double a, double[] out) {
            double g = value(x, sigma, a);
            double phi = Math.exp(-0.5 * (x / sigma) * (x / sigma)) / (sigma * SQRT_2PI);
            out[0] = g;
            out[1] = (phi - g) / a;
            out[2] = (sigma / (a * a)) * (g - phi) - phi * x / (sigma * a);
            out[3] = g * (x / (a * a) - 1 / a - sigma * sigma / (a * a * a)) + phi * sigma * sigma / (a * a * a);
        }
    },

    /**
     * A right triangle of base L = 3a, highest at its sharp front (x = 0) and falling linearly to
     * zero at x = L, convolved with the Gaussian: with α = (x − L)/σ, β = x/σ, Φ and φ the standard
     * normal distribution and density, D = Φ(β) − Φ(α) and E = φ(α) − φ(β),
     * {@code g = (2/L)·[(1 − x/L)·D + (σ/L)·E]} (the two integrals of the straight flank against the
     * Gaussian, with u = x − σz). The triangle's centroid lies L/3 = a behind its front, as an EMG's
     * lies τ behind its Gaussian centre. Derivatives (simplified here from the definition):
     * ∂g/∂x = (2/L)·[φ(β)/σ − D/L], ∂g/∂σ = (2/L)·[E/L − β·φ(β)/σ],
     * ∂g/∂L = −g/L + 2(xD − σE)/L³, and ∂g/∂a = 3·∂g/∂L.
     */
    TRIANGLE(0.5, 0.2) {
        @Override
        double value(double x, double sigma, double a) {
            double base = TRIANGLE_BASE_PER_SIZE * a;
            double alpha = (x - base) / sigma;
            double beta = x / sigma;
            double d = normalCdf(beta) - normalCdf(alpha);
            double e = normalDensity(alpha) - normalDensity(beta);
            return 2 / base * ((1 - x / base) * d + sigma / base * e);
        }

        @Override
        void evaluate(double x, double sigma, double a, double[] out) {
            double base = TRIANGLE_BASE_PER_SIZE * a;
            double alpha = (x - base) / sigma;
            double beta = x / sigma;
            double d = normalCdf(beta) - normalCdf(alpha);
            double phiBeta = normalDensity(beta);
            double e = normalDensity(alpha) - phiBeta;
            double g = 2 / base * ((1 - x / base) * d + sigma / base * e);
            out[0] = g;
            out[1] = 2 / base * (phiBeta / sigma - d / base);
            out[2] = 2 / base * (e / base - beta * phiBeta / sigma);
            out[3] = TRIANGLE_BASE_PER_SIZE * (-g / base + 2 * (x * d - sigma * e) / (base * base * base));
        }
    };

    private final double variancePerSquaredSize;
    private final double thirdMomentPerCubedSize;

    ZoneForm(double variancePerSquaredSize, double thirdMomentPerCubedSize) {
        this.variancePerSquaredSize = variancePerSquaredSize;
        this.thirdMomentPerCubedSize = thirdMomentPerCubedSize;
    }

    /** What the skew adds to the Gaussian's variance, per a²: 1 for the EMG (Grushka 1972), 1/2 for
     *  the triangle (a right triangle of base L has variance L²/18, and L = 3a). */
    double variancePerSquaredSize() {
        return variancePerSquaredSize;
    }

    /** The third central moment per a³: 2 for the EMG (Grushka 1972), 1/5 for the triangle (a right
     *  triangle of base L has L³/135). */
    double thirdMomentPerCubedSize() {
        return thirdMomentPerCubedSize;
    }

    /** The triangle's base per unit of size: its centroid lies a third of the base behind the front. */
    static final double TRIANGLE_BASE_PER_SIZE = 3.0;
    private static final double SQRT_2 = Math.sqrt(2.0);
    private static final double SQRT_2PI = Math.sqrt(2 * Math.PI);

    /**
     * The unit-area form at a distance {@code x} behind the sharp side.
     *
     * @param x     distance behind the sharp side along the skew direction, s
     * @param sigma Gaussian SD σ, s (&gt; 0)
     * @param a     size: distance from the sharp side to the first moment, s (&gt; 0)
     */
    abstract double value(double x, double sigma, double a);

    /** The value and its derivatives in x, σ and a, into {@code out[0..3]}. */
    abstract void evaluate(double x, double sigma, double a, double[] out);

    /** Φ(z) = erfc(−z/√2)/2. */
    private static double normalCdf(double z) {
        return 0.5 * Erfc.value(-z / SQRT_2);
    }

    /** φ(z). */
    private static double normalDensity(double z) {
        return Math.exp(-0.5 * z * z) / SQRT_2PI;
    }
}
