package org.wurtzkit.examples;

import java.util.List;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;
import org.wurtzkit.materials.data.JsonParameterSetReader;

/**
 * Registers the parameter set of the fictional {@value DemoLab#LAB}, {@value #NAME}, through
 * {@link java.util.ServiceLoader} (listed in
 * {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider} of this module): the way a
 * team plugs its own measured set into wurtzkit.
 *
 * <p><b>The data is invented.</b> The file {@code tarnwick-lab-2025.json} is the
 * vurgaftman-meyer-2003 set with five values replaced by made-up numbers (GaN C13, C33 and static
 * permittivity, AlN e33 and spontaneous polarization) that cite the fictional lab; it describes no
 * measurement and exists only to show the mechanism, and to give the parameter-set spread a third
 * member that is labelled as invented wherever it appears. Its {@code "insulators"} block carries the
 * four built-in dielectrics by reference and adds the lab's own PECVD film {@code "TNL-SiN"}
 * (permittivity 7.0, gap 4.9 eV, offset to GaN 2.2 eV, all invented), the way a team declares a
 * dielectric it has characterised.
 */
public final class DemoLabParameterSets implements ParameterSetProvider {
    /** Name of the invented set. */
    public static final String NAME = "tarnwick-lab-2025";

    /** Public no-argument constructor, as {@link java.util.ServiceLoader} requires. */
    public DemoLabParameterSets() {
    }

    /**
     * @return the invented set, read from its file on each call: {@code ParameterSets} calls this
     *         once per (re)load, and a typo in the file is then reported against this set only (and
     *         can be fixed and reloaded), instead of failing a static initializer for good
     */
    @Override
    public List<ParameterSet> parameterSets() {
        return List.of(JsonParameterSetReader.readResource(DemoLabParameterSets.class, "tarnwick-lab-2025.json"));
    }

    /**
     * @param setName a parameter set's name
     * @return the name with " (invented)" appended for the demo lab's set, for legends and tables
     */
    public static String label(String setName) {
        return NAME.equals(setName) ? setName + " (invented)" : setName;
    }
}
