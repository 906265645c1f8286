package org.mobident.mobility;

/** Argument checks shared by the scales of this package; each throws IllegalArgumentException. */
final class Checks {
    private Checks() {
    }

    static double positiveTime(String name, double timeS) {
        if (!(timeS > 0 && Double.isFinite(timeS))) {
            throw new IllegalArgumentException(name + " must be a positive number of s, got " + timeS);
        }
        return timeS;
    }

    static double standardDeviation(String name, double sd) {
        if (!(sd >= 0 && Double.isFinite(sd))) {
            throw new IllegalArgumentException(name + " must be zero or a positive finite number, got " + sd);
        }
        return sd;
    }

    static double ramp(double rampS) {
        if (!(rampS >= 0 && Double.isFinite(rampS))) {
            throw new IllegalArgumentException("ramp must be zero or a positive number of s, got " + rampS);
        }
        return rampS;
    }

    static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number, got " + value);
        }
        return value;
    }

    static void geometry(double detectorLengthCm, double totalLengthCm, double voltageKv) {
        if (!(detectorLengthCm > 0 && Double.isFinite(detectorLengthCm))) {
            throw new IllegalArgumentException("detector length must be a positive number of cm, got "
                    + detectorLengthCm);
        }
        if (!(totalLengthCm > 0 && Double.isFinite(totalLengthCm))) {
            throw new IllegalArgumentException("total length must be a positive number of cm, got " + totalLengthCm);
        }
        if (!(detectorLengthCm < totalLengthCm)) {
            throw new IllegalArgumentException("detector length (" + detectorLengthCm
                    + " cm) must be shorter than total length (" + totalLengthCm + " cm)");
        }
        if (voltageKv == 0 || !Double.isFinite(voltageKv)) {
            throw new IllegalArgumentException("voltage must be a non-zero number of kV (signed), got " + voltageKv);
        }
    }

    /** True when a and b agree to within the engine's relative epsilon. */
    static boolean nearlyEqual(double a, double b) {
        return Math.abs(a - b) <= org.mobident.Tolerances.RELATIVE_EPSILON * Math.max(Math.abs(a), Math.abs(b));
    }
}
