package org.wurtzkit.material;

/**
 * Deformation potentials (eV) in the convention of S. L. Chuang and C. S. Chang, Phys. Rev. B 54,
 * 2491 (1996): the conduction-band shift is a_cz eps_zz + a_ct (eps_xx + eps_yy); the heavy-hole
 * band shift (no shear, c-plane) is (D1 + D3) eps_zz + (D2 + D4)(eps_xx + eps_yy).
 *
 * @param conductionParallel      a_cz
 * @param conductionPerpendicular a_ct
 * @param d1 D1
 * @param d2 D2
 * @param d3 D3
 * @param d4 D4
 */
public record DeformationPotentials(double conductionParallel, double conductionPerpendicular, double d1, double d2,
        double d3, double d4) {
}
