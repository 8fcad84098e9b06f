package org.wurtzkit.polarization;

/**
 * Crystal polarity of a c-plane stack. With z along the growth direction, the [0001] direction
 * (+c, the metal-to-nitrogen bond along c) points along +z for metal-face growth and along -z for
 * N-face growth, so the growth-direction component of any polarization P along [0001] is
 * {@code sign() * P} (O. Ambacher et al., J. Appl. Phys. 85, 3222 (1999)).
 */
public enum Polarity {
    /** Ga/Al/In-face: +c points from the substrate to the surface. */
    METAL_FACE(+1),
    /** N-face: +c points from the surface to the substrate. */
    N_FACE(-1);

    private final int sign;

    Polarity(int sign) {
        this.sign = sign;
    }

    /** {@return +1 for metal-face, -1 for N-face} */
    public int sign() {
        return sign;
    }

    /** {@return the other polarity} */
    public Polarity inverted() {
        return this == METAL_FACE ? N_FACE : METAL_FACE;
    }
}
