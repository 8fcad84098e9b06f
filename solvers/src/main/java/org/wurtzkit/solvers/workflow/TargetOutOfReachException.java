package org.wurtzkit.solvers.workflow;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * A {@link TargetSearch} target lies outside the range of values the structure family reaches at
 * the two ends of the searched interval. The message names the target quantity, the target, the
 * reachable range and the searched parameter with its interval, e.g. {@code "target sheet_density
 * (cm^-2) = 3.0E13 is outside the allowed range [8.66e+12, 1.33e+13] (reached with
 * barrier_thickness in [10, 100] nm)"}.
 */
public class TargetOutOfReachException extends InvalidParameterException {
    private static final long serialVersionUID = 1L;
    /** The requested target value; part of the serialized form. */
    private final double target;
    /** The smaller of the values at the two ends of the interval; part of the serialized form. */
    private final double reachableMin;
    /** The larger of the values at the two ends of the interval; part of the serialized form. */
    private final double reachableMax;
    /** Header of the searched parameter's column; part of the serialized form. */
    private final String searchedParameter;
    /** Lower end of the searched interval; part of the serialized form. */
    private final double lowerBound;
    /** Upper end of the searched interval; part of the serialized form. */
    private final double upperBound;

    TargetOutOfReachException(Column quantity, double target, double reachableMin, double reachableMax,
            Column parameter, double lowerBound, double upperBound) {
        super("target " + quantity.name() + (quantity.unit().isEmpty() ? "" : " (" + quantity.unit() + ")"),
                Double.toString(target), "[" + Text.num(reachableMin) + ", " + Text.num(reachableMax)
                        + "] (reached with " + parameter.name() + " in [" + Text.num(lowerBound) + ", "
                        + Text.num(upperBound) + "]" + (parameter.unit().isEmpty() ? "" : " " + parameter.unit())
                        + ")");
        this.target = target;
        this.reachableMin = reachableMin;
        this.reachableMax = reachableMax;
        this.searchedParameter = parameter.header();
        this.lowerBound = lowerBound;
        this.upperBound = upperBound;
    }

    /** {@return the requested target} */
    public double target() {
        return target;
    }

    /** {@return the smaller of the values at the two ends of the interval} */
    public double reachableMin() {
        return reachableMin;
    }

    /** {@return the larger of the values at the two ends of the interval} */
    public double reachableMax() {
        return reachableMax;
    }

    /** {@return the searched parameter, as a column header (name_unit)} */
    public String searchedParameter() {
        return searchedParameter;
    }

    /** {@return lower end of the searched interval} */
    public double lowerBound() {
        return lowerBound;
    }

    /** {@return upper end of the searched interval} */
    public double upperBound() {
        return upperBound;
    }
}
