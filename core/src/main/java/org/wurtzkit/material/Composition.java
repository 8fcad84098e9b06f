package org.wurtzkit.material;

import org.wurtzkit.errors.InvalidParameterException;

/**
 * Composition of the wurtzite alloy Al<sub>x</sub>In<sub>y</sub>Ga<sub>1-x-y</sub>N.
 *
 * <p>Immutable. Fractions are checked at construction: each in [0, 1] and x + y &le; 1 (a
 * round-off excess of up to 1e-12 is accepted, nothing larger).
 *
 * @param aluminium Al fraction x
 * @param indium    In fraction y
 */
public record Composition(double aluminium, double indium) {

    /** Binary GaN. */
    public static final Composition GAN = new Composition(0, 0);
    /** Binary AlN. */
    public static final Composition ALN = new Composition(1, 0);
    /** Binary InN. */
    public static final Composition INN = new Composition(0, 1);

    /**
     * Creates the record and checks the fractions.
     *
     * @param aluminium Al fraction x
     * @param indium    In fraction y
     * @throws org.wurtzkit.errors.InvalidParameterException if a component is null, not
     *         finite or outside its documented range
     */
    public Composition {
        check("Al fraction x", aluminium);
        check("In fraction y", indium);
        if (aluminium + indium > 1 + 1e-12) {
            throw new InvalidParameterException("Al + In fraction x + y", Double.toString(aluminium + indium),
                    "[0, 1] (x = " + aluminium + ", y = " + indium + ")");
        }
        // -0.0 passes the range check; make it +0.0 so that, e.g., alGaN(-0.0) equals GAN
        aluminium += 0.0;
        indium += 0.0;
    }

    private static void check(String name, double v) {
        if (!(v >= 0 && v <= 1)) {
            throw new InvalidParameterException(name, Double.toString(v), "[0, 1]");
        }
    }

    /**
     * Returns the composition of the ternary Al<sub>x</sub>Ga<sub>1-x</sub>N.
     *
     * @param x Al fraction in [0, 1]
     * @return Al<sub>x</sub>Ga<sub>1-x</sub>N
     */
    public static Composition alGaN(double x) {
        return new Composition(x, 0);
    }

    /**
     * Returns the composition of the ternary In<sub>y</sub>Ga<sub>1-y</sub>N.
     *
     * @param y In fraction in [0, 1]
     * @return In<sub>y</sub>Ga<sub>1-y</sub>N
     */
    public static Composition inGaN(double y) {
        return new Composition(0, y);
    }

    /**
     * @param y In fraction in [0, 1]
     * @return In<sub>y</sub>Al<sub>1-y</sub>N (lattice matched to GaN near y = 0.18)
     */
    public static Composition inAlN(double y) {
        check("In fraction y", y);
        return new Composition(1 - y, y);
    }

    /**
     * @param x Al fraction
     * @param y In fraction
     * @return Al<sub>x</sub>In<sub>y</sub>Ga<sub>1-x-y</sub>N
     */
    public static Composition alInGaN(double x, double y) {
        return new Composition(x, y);
    }

    /** {@return Ga fraction 1 - x - y (never negative)} */
    public double gallium() {
        return Math.max(0.0, 1.0 - aluminium - indium);
    }

    /**
     * @param b a binary
     * @return the fraction of that binary in this alloy
     */
    public double fraction(Binary b) {
        return switch (b) {
            case GAN -> gallium();
            case ALN -> aluminium;
            case INN -> indium;
        };
    }

    /** {@return true if this is one of the three binaries} */
    public boolean isBinary() {
        return aluminium == 1 || indium == 1 || (aluminium == 0 && indium == 0);
    }

    /**
     * Linear interpolation between two compositions (used for graded layers).
     *
     * @param other the composition at t = 1
     * @param t     position in [0, 1]
     * @return (1 - t) this + t other
     */
    public Composition interpolate(Composition other, double t) {
        org.wurtzkit.errors.Require.nonNull("other composition", other);
        org.wurtzkit.errors.Require.inRange("interpolation position t", t, 0, 1);
        double x = aluminium + t * (other.aluminium - aluminium);
        double y = indium + t * (other.indium - indium);
        // a convex combination of two valid compositions is valid; max(0, .) only removes round-off
        return new Composition(Math.max(0.0, x), Math.max(0.0, y));
    }

    /** {@return a readable formula, e.g. "Al0.25Ga0.75N", "In0.18Al0.82N", "GaN"} */
    public String formula() {
        double ga = gallium();
        if (aluminium == 0 && indium == 0) {
            return "GaN";
        }
        if (aluminium == 1) {
            return "AlN";
        }
        if (indium == 1) {
            return "InN";
        }
        StringBuilder sb = new StringBuilder();
        if (aluminium > 0 && indium > 0 && ga > 0) {
            sb.append("Al").append(num(aluminium)).append("In").append(num(indium)).append("Ga").append(num(ga));
        } else if (indium > 0 && aluminium > 0) {
            sb.append("In").append(num(indium)).append("Al").append(num(aluminium));
        } else if (aluminium > 0) {
            sb.append("Al").append(num(aluminium)).append("Ga").append(num(ga));
        } else {
            sb.append("In").append(num(indium)).append("Ga").append(num(ga));
        }
        return sb.append('N').toString();
    }

    private static String num(double v) {
        String s = String.format(java.util.Locale.ROOT, "%.4f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }

    @Override
    public String toString() {
        return formula();
    }
}
