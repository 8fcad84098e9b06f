package org.wurtzkit.materials.data;

import java.util.List;
import org.wurtzkit.errors.ErrorKind;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.ParameterSetProvider;
import org.wurtzkit.material.ParameterSets;

/**
 * The published parameter sets shipped with wurtzkit, registered for {@link java.util.ServiceLoader}
 * in {@code META-INF/services/org.wurtzkit.material.ParameterSetProvider}:
 *
 * <ul>
 * <li>{@value #VURGAFTMAN_MEYER_2003} (the default, {@link ParameterSets#DEFAULT_NAME}): binaries
 * after I. Vurgaftman &amp; J. R. Meyer, J. Appl. Phys. 94, 3675 (2003), with the spontaneous
 * polarization and piezoelectric constants of F. Bernardini, V. Fiorentini &amp; D. Vanderbilt,
 * Phys. Rev. B 56, R10024 (1997); recommended polarization model
 * {@link org.wurtzkit.material.PolarizationModel#LINEAR}.</li>
 * <li>{@value #AMBACHER_2002}: following O. Ambacher et al., J. Phys.: Condens. Matter 14, 3399
 * (2002), with the nonlinear polarization of F. Bernardini &amp; V. Fiorentini, Phys. Rev. B 64,
 * 085207 (2001); recommended model
 * {@link org.wurtzkit.material.PolarizationModel#NONLINEAR}.</li>
 * </ul>
 *
 * Each file is read once, on first use (thread-safely; a broken file fails with its
 * {@link ParameterSetFormatException} on every call), by {@link JsonParameterSetReader}; each value's source and
 * note (verified against what, or from memory) is in the file and in
 * {@link FileParameterSet#notes()}.
 */
public final class BuiltInParameterSets implements ParameterSetProvider {
    /** Name of the Vurgaftman &amp; Meyer 2003 set (equal to {@link ParameterSets#DEFAULT_NAME}). */
    public static final String VURGAFTMAN_MEYER_2003 = ParameterSets.DEFAULT_NAME;
    /** Name of the Ambacher et al. 2002 set. */
    public static final String AMBACHER_2002 = "ambacher-2002";

    /** Public no-argument constructor, as {@link java.util.ServiceLoader} requires. */
    public BuiltInParameterSets() {
    }

    private static final Object LOCK = new Object();
    private static volatile FileParameterSet vm03;
    private static volatile FileParameterSet a02;

    private static FileParameterSet load(String resource, String expectedName) {
        FileParameterSet s = JsonParameterSetReader.readResource(BuiltInParameterSets.class, resource);
        if (!s.name().equals(expectedName)) {
            throw new WurtzkitException(ErrorKind.MALFORMED_DATA, "built-in file \"" + resource + "\" declares the set \""
                    + s.name() + "\", expected \"" + expectedName + "\"");
        }
        return s;
    }

    /** {@return the two built-in sets, the default first} */
    @Override
    public List<ParameterSet> parameterSets() {
        return List.of(vurgaftmanMeyer2003(), ambacher2002());
    }

    /** {@return the {@value #VURGAFTMAN_MEYER_2003} set, without going through the service loader} */
    public static FileParameterSet vurgaftmanMeyer2003() {
        FileParameterSet s = vm03;
        if (s == null) {
            synchronized (LOCK) {
                s = vm03;
                if (s == null) {
                    s = load("vurgaftman-meyer-2003.json", VURGAFTMAN_MEYER_2003);
                    vm03 = s;
                }
            }
        }
        return s;
    }

    /** {@return the {@value #AMBACHER_2002} set, without going through the service loader} */
    public static FileParameterSet ambacher2002() {
        FileParameterSet s = a02;
        if (s == null) {
            synchronized (LOCK) {
                s = a02;
                if (s == null) {
                    s = load("ambacher-2002.json", AMBACHER_2002);
                    a02 = s;
                }
            }
        }
        return s;
    }
}
