package org.wurtzkit.testing;

import static org.wurtzkit.units.Units.NM;

import org.wurtzkit.material.Composition;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Provenance;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.InsulatorLayer;
import org.wurtzkit.structure.InterfaceSheet;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;

/**
 * Gate-stack fixtures shared by the MOS and MIS tests: an ideal MOS capacitor on n-GaN without
 * polarization contrast (the textbook's assumptions) and an MIS-HEMT.
 */
public final class GateStacks {
    /** Donor density of the MOS capacitor's n-GaN (m^-3): 1e16 cm^-3, non-degenerate. */
    public static final double MOS_DONORS = 1e22;
    /** Thickness of the MOS capacitor's n-GaN (m): more than four depletion widths at 2 V. */
    public static final double MOS_GAN = 2000 * NM;

    private GateStacks() {
    }

    /**
     * @param set the parameter set
     * @return the set's GaN with its spontaneous polarization set to zero (a relaxed layer of it has
     *         no polarization at all): a test fixture for the textbook MOS capacitor
     */
    public static WurtziteMaterial unpolarizedGaN(ParameterSet set) {
        Source fixture = Source.of("test-fixture", "GaN of the parameter set with P_sp set to zero (test fixture)");
        return set.material(Composition.GAN).toBuilder("GaN without polarization (test fixture)")
                .set(MaterialParameter.SPONTANEOUS_POLARIZATION, 0, Provenance.tabulated(fixture)).build();
    }

    /**
     * An ideal MOS capacitor: 2 um of unpolarized n-GaN with 1e16 cm^-3 donors of degeneracy 1e-6
     * (fully ionized, as the textbook assumes), a sheet on its top face, the insulator, and a gate.
     *
     * @param set       the parameter set
     * @param insulator the gate insulator
     * @param toxM      its thickness (m)
     * @param phiB      gate Fermi level below the insulator's conduction band (eV)
     * @param biasV     gate bias (V)
     * @param sheet     fixed charge and interface states at the insulator/GaN interface
     * @return the stack
     */
    public static Structure mos(ParameterSet set, Insulator insulator, double toxM, double phiB, double biasV,
            InterfaceSheet sheet) {
        Layer gan = Layer.of("n-GaN", unpolarizedGaN(set), MOS_GAN)
                .withDopant(new Dopant(Dopant.Kind.DONOR, MOS_DONORS, 0.0, 1e-6));
        return Structure.builder(set).grow(gan).sheetOnTop(sheet).deposit(new InsulatorLayer("gate oxide", insulator,
                toxM)).top(TopBoundary.schottky(phiB, biasV)).build();
    }
}
