package org.wurtzkit.strain;

import org.wurtzkit.material.DeformationPotentials;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.units.Decimals;

/**
 * Strain-induced shifts of the band edges of a c-plane wurtzite layer, in the convention of S. L.
 * Chuang and C. S. Chang, Phys. Rev. B 54, 2491 (1996): conduction band
 * dEc = a_cz eps_zz + a_ct (eps_xx + eps_yy); heavy-hole valence band (no shear)
 * dEv = (D1 + D3) eps_zz + (D2 + D4)(eps_xx + eps_yy).
 *
 * @param conductionEv shift of the conduction-band minimum (eV)
 * @param valenceEv    shift of the heavy-hole valence-band maximum (eV)
 */
public record BandEdgeShift(double conductionEv, double valenceEv) {
    /**
     * @param m      material (deformation potentials)
     * @param strain its strain
     * @return the shifts
     */
    public static BandEdgeShift of(WurtziteMaterial m, Strain strain) {
        DeformationPotentials d = m.deformationPotentials();
        double inPlane = strain.xx() + strain.yy();
        double dc = d.conductionParallel() * strain.zz() + d.conductionPerpendicular() * inPlane;
        double dv = (d.d1() + d.d3()) * strain.zz() + (d.d2() + d.d4()) * inPlane;
        return new BandEdgeShift(dc, dv);
    }

    /** {@return the change of the gap dEc - dEv (eV)} */
    public double gapEv() {
        return conductionEv - valenceEv;
    }

    /** @return e.g. {@code "dE_c = -0.012 eV, dE_v = 0.008 eV"} */
    @Override
    public String toString() {
        return "dE_c = " + Decimals.format(conductionEv, "eV") + ", dE_v = " + Decimals.format(valenceEv, "eV");
    }
}
