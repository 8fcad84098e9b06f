package org.wurtzkit.solvers.schrodinger;

import java.util.Arrays;

/**
 * Immutable result of {@link EffectiveMassHamiltonian}: energies (eV) in ascending order and the
 * matching wavefunctions on all mesh nodes (units m^-1/2, zero at the two Dirichlet end nodes),
 * normalised so that {@code sum_i psi_i² w_i = 1} with the box widths {@code w_i} of
 * {@link EffectiveMassHamiltonian#boxWidths()}. Different states are orthogonal in the same
 * weighted inner product.
 *
 * <p>Sign convention: the wavefunction is positive where {@code |psi| sqrt(w)} is largest (the
 * first such node on ties).
 */
public final class BoundStates {

    private final double[] energies;
    private final double[][] wavefunctions;

    /** Takes ownership of the arrays; built only by {@link EffectiveMassHamiltonian}. */
    BoundStates(double[] energies, double[][] wavefunctions) {
        this.energies = energies;
        this.wavefunctions = wavefunctions;
    }

    /**
     * Number of states held.
     *
     * @return size, possibly 0 for a bound-state search that found nothing
     */
    public int size() {
        return energies.length;
    }

    /**
     * Energy of state {@code i} (0 = ground state).
     *
     * @param i state index in {@code [0, size()-1]}
     * @return energy in eV
     * @throws IllegalArgumentException if {@code i} is out of range
     */
    public double energy(int i) {
        checkState(i);
        return energies[i];
    }

    /**
     * All energies, ascending.
     *
     * @return a copy (eV)
     */
    public double[] energies() {
        return energies.clone();
    }

    /**
     * Wavefunction of state {@code i} on all mesh nodes.
     *
     * @param i state index in {@code [0, size()-1]}
     * @return a copy (m^-1/2), zero at both end nodes
     * @throws IllegalArgumentException if {@code i} is out of range
     */
    public double[] wavefunction(int i) {
        checkState(i);
        return wavefunctions[i].clone();
    }

    /**
     * One value of a wavefunction, without copying.
     *
     * @param i    state index in {@code [0, size()-1]}
     * @param node node index in {@code [0, N-1]}
     * @return psi_i at the node (m^-1/2)
     * @throws IllegalArgumentException if an index is out of range
     */
    public double amplitude(int i, int node) {
        checkState(i);
        double[] p = wavefunctions[i];
        if (node < 0 || node >= p.length) {
            throw new org.wurtzkit.errors.InvalidParameterException("node", Integer.toString(node), "[0, "
                    + (p.length - 1) + "]");
        }
        return p[node];
    }

    private void checkState(int i) {
        if (i < 0 || i >= energies.length) {
            throw new org.wurtzkit.errors.InvalidParameterException("i", Integer.toString(i), "[0, "
                    + (energies.length - 1) + "]");
        }
    }

    /**
     * Short description with the energies.
     *
     * @return text such as {@code BoundStates[size=2, energiesEv=[0.05, 0.18]]}
     */
    @Override
    public String toString() {
        return "BoundStates[size=" + energies.length + ", energiesEv=" + Arrays.toString(energies) + "]";
    }
}
