package org.wurtzkit.solvers.transport;

import static org.wurtzkit.units.Units.NM;

/** How the transmission of the computed barrier is evaluated ({@link LeakageOptions#transmission()}). */
public enum TransmissionMethod {
    /**
     * {@link WkbTransmission}: the semiclassical exponent, exact for the piecewise-linear profile and
     * cheap (one pass over the nodes per energy). The default: it is the approximation under which
     * thermionic-field and field emission are usually analysed (F. A. Padovani and R. Stratton,
     * Solid-State Electron. 9, 695 (1966)), and it leaves out only the prefactor of abrupt steps.
     */
    WKB,
    /**
     * {@link TransferMatrixTransmission} with {@link LeakageOptions#slabWidth()}: exact for the
     * profile up to the slab width, including the reflection at the band steps and mass changes;
     * O(slabs) per energy, tens of times the cost of WKB. The check of WKB on a real profile.
     */
    TRANSFER_MATRIX;

    /** Default slab width of the transfer matrix (m): 0.02 nm. */
    public static final double DEFAULT_SLAB_WIDTH = 0.02 * NM;

    /**
     * @param barrier   the barrier
     * @param slabWidth slab width for the transfer matrix (m)
     * @return the transmission of that barrier by this method
     */
    public Transmission of(TunnelBarrier barrier, double slabWidth) {
        return this == WKB ? new WkbTransmission(barrier) : new TransferMatrixTransmission(barrier, slabWidth);
    }
}
