package org.wurtzkit.materials.data;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.wurtzkit.errors.Require;
import org.wurtzkit.material.AlloyBowing;
import org.wurtzkit.material.AlloyScattering;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Insulator;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.material.Source;
import org.wurtzkit.material.WurtziteMaterial;
import org.wurtzkit.material.PolarizationModel;

/**
 * An immutable, thread-safe {@link ParameterSet} read from a data file by
 * {@link JsonParameterSetReader}. Besides the {@link ParameterSet} view it keeps the file name and
 * the free-text note written beside each value (how the value was taken: verified against what,
 * or from memory).
 */
public final class FileParameterSet implements ParameterSet {
    private final String name;
    private final String description;
    private final String fileName;
    private final PolarizationModel model;
    private final Map<Binary, WurtziteMaterial> binaries;
    private final AlloyBowing bowing;
    private final AlloyScattering alloyScattering;
    private final List<Source> sources;
    private final Map<String, String> notes;
    private final java.util.OptionalDouble conductionBandOffsetFraction;
    private final List<Insulator> insulators;

    FileParameterSet(String name, String description, String fileName, PolarizationModel model,
            Map<Binary, WurtziteMaterial> binaries, AlloyBowing bowing, AlloyScattering alloyScattering, List<Source> sources,
            Map<String, String> notes, java.util.OptionalDouble conductionBandOffsetFraction, List<Insulator> insulators) {
        this.conductionBandOffsetFraction = conductionBandOffsetFraction;
        this.insulators = List.copyOf(insulators);
        this.name = name;
        this.description = description;
        this.fileName = fileName;
        this.model = model;
        this.binaries = Collections.unmodifiableMap(new EnumMap<>(binaries));
        this.bowing = bowing;
        this.alloyScattering = alloyScattering;
        this.sources = List.copyOf(sources);
        this.notes = Collections.unmodifiableMap(new LinkedHashMap<>(notes));
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String description() {
        return description;
    }

    /** {@return the file name the set was read from (as given to the reader)} */
    public String fileName() {
        return fileName;
    }

    @Override
    public WurtziteMaterial binary(Binary binary) {
        return binaries.get(Require.nonNull("binary", binary));
    }

    @Override
    public AlloyBowing bowing() {
        return bowing;
    }

    /** {@return the file's optional {@code conductionBandOffsetFraction}} */
    @Override
    public java.util.OptionalDouble conductionBandOffsetFraction() {
        return conductionBandOffsetFraction;
    }

    /** {@return the insulators of the file's {@code "insulators"} block, in file order} */
    @Override
    public List<Insulator> insulators() {
        return insulators;
    }

    @Override
    public AlloyScattering alloyScattering() {
        return alloyScattering;
    }

    @Override
    public PolarizationModel recommendedPolarizationModel() {
        return model;
    }

    @Override
    public List<Source> sources() {
        return sources;
    }

    /**
     * @param binary    GaN, AlN or InN
     * @param parameter a parameter
     * @return the note written beside that value in the file ("" if none; for
     *         {@link MaterialParameter#SPONTANEOUS_POLARIZATION_BOWING}, which binaries do not state,
     *         the loader's own explanation)
     */
    public String note(Binary binary, MaterialParameter parameter) {
        Require.nonNull("binary", binary);
        Require.nonNull("parameter", parameter);
        return notes.getOrDefault("binaries." + binary.formula() + "." + parameter.key(), "");
    }

    /**
     * Every note of the file keyed by the dotted path of its value, e.g. {@code binaries.GaN.C13} or
     * {@code bowing.gap.AlGaN}.
     *
     * @return the notes in file order (unmodifiable)
     */
    public Map<String, String> notes() {
        return notes;
    }

    @Override
    public String toString() {
        return name + " (" + fileName + ")";
    }
}
