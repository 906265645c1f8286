package org.mobident.signal;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * The one place where the zone fits of this package call the Levenberg–Marquardt optimiser of
 * Apache Commons Math (a translation of MINPACK's lmder: Moré, in Numerical Analysis, ed. G. A.
 * Watson, Springer LNM 630 (1978) 105), with the model's analytic Jacobian and a validator that
 * keeps the parameters in bounds.
 */
final class LevenbergMarquardt {

    /** Relative threshold below which (JᵀJ) is treated as singular when it is inverted. */
    private static final double SINGULARITY_THRESHOLD = 1e-14;

    /**
     * A converged fit.
     *
     * @param point       the parameters
     * @param rss         residual sum of squares
     * @param covariance  (JᵀJ)⁻¹ at the optimum (multiply by the residual variance for the
     *                    parameters' covariance), by row, or null when not asked for; plain arrays,
     *                    so that the callers' reads do not meet two matrix classes (the optimiser's
     *                    inverse is a block matrix, the models' Jacobians are not), which made the
     *                    JIT throw their compiled code away and compile it again
     */
    record Solution(double[] point, double rss, double[][] covariance) {
    }

    private LevenbergMarquardt() {
    }

    /**
     * Fits the model from {@code start}; null when it does not converge within the caps, the
     * parameters are not determined (singular JᵀJ, when the covariance is asked for) or the residual
     * sum of squares is not finite.
     */
    static Solution fit(double[] start, MultivariateJacobianFunction model, double[] target,
                        ParameterValidator validator, int maxEvaluations, int maxIterations, boolean covariance) {
        LeastSquaresBuilder problem = new LeastSquaresBuilder()
                .start(start)
                .model(model)
                .target(target)
                .parameterValidator(validator)
                .lazyEvaluation(false)
                .maxEvaluations(maxEvaluations)
                .maxIterations(maxIterations);
        try {
            LeastSquaresOptimizer.Optimum optimum = new LevenbergMarquardtOptimizer().optimize(problem.build());
            double rss = optimum.getCost() * optimum.getCost();
            if (!Double.isFinite(rss)) {
                return null;
            }
            return new Solution(optimum.getPoint().toArray(), rss,
                    covariance ? optimum.getCovariances(SINGULARITY_THRESHOLD).getData() : null);
        } catch (MathIllegalStateException | SingularMatrixException e) {
            return null;
        }
    }
}
