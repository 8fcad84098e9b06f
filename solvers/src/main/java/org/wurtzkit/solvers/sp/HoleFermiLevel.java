package org.wurtzkit.solvers.sp;

/**
 * Where the holes' quasi-Fermi level sits. Electrons are always in equilibrium with the bottom
 * contact (the channel's source and drain), whose Fermi level is 0 eV. Under a gate bias the gate's
 * Fermi level is at -qV; holes collected at the surface under strong reverse bias flow into the gate,
 * so by default their quasi-Fermi level follows the gate.
 */
public enum HoleFermiLevel {
    /** Holes in equilibrium with the gate metal: E_Fp = -qV_g (the default). */
    GATE,
    /** Holes in equilibrium with the bottom contact: E_Fp = 0 (full equilibrium). */
    BOTTOM_CONTACT
}
