package org.wurtzkit.solvers.transport.mobility;

import org.wurtzkit.units.Constants;

/** Shared constants of the rate formulas. */
final class Rates {
    static final double HBAR3 = Constants.HBAR * Constants.HBAR * Constants.HBAR;
    static final double E = Constants.ELEMENTARY_CHARGE;

    private Rates() {
    }
}
