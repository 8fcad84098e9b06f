package org.wurtzkit.solvers.workflow;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import org.wurtzkit.bands.BandAlignment;
import org.wurtzkit.errors.InvalidParameterException;
import org.wurtzkit.errors.Require;
import org.wurtzkit.errors.WurtzkitException;
import org.wurtzkit.material.Binary;
import org.wurtzkit.material.Composition;
import org.wurtzkit.material.MaterialParameter;
import org.wurtzkit.material.ParameterSet;
import org.wurtzkit.solvers.sp.SelfConsistentSolver;
import org.wurtzkit.structure.Dopant;
import org.wurtzkit.structure.Layer;
import org.wurtzkit.structure.LayerMaterial;
import org.wurtzkit.structure.Structure;
import org.wurtzkit.structure.TopBoundary;
import org.wurtzkit.units.Units;
import org.wurtzkit.warnings.Warning;

/**
 * A tolerance study: how growth tolerances and uncertain material constants spread the results of
 * a design. Each sample draws every {@link Tolerance} from its distribution, applies the draws to a
 * template structure, and computes the chosen quantities with the full solver; the result holds
 * every sample, the summary statistics of every output and, optionally, the first-order and
 * total-effect Sobol indices that say which tolerance dominates the spread.
 *
 * <pre>{@code
 * ToleranceStudyResult r = ToleranceStudy.builder(template)
 *         .tolerance(Tolerance.alFraction("barrier", Distribution.normalWithin(0.26, 0.01, 3)))
 *         .tolerance(Tolerance.layerThicknessNm("barrier", Distribution.normalWithin(22, 0.66, 3)))
 *         .tolerance(Tolerance.material(Binary.ALN, MaterialParameter.SPONTANEOUS_POLARIZATION,
 *                 Distribution.normal(-0.090, 0.009)))
 *         .samples(2000).seed(42).sensitivity(true)
 *         .build()
 *         .run();
 * r.summary(0);           // n_s: mean, standard deviation, quantiles
 * r.sensitivity(0).ranking();
 * }</pre>
 *
 * <p><b>Reproducible sample by sample.</b> Evaluation j is a pure function of (template,
 * tolerances, evaluators, solver options, seed, j): {@link #evaluate(int)} computes it alone, from
 * a cold start, with the random numbers of {@link SampleDesign}. The local {@link #run()} and any
 * distributed run that calls {@link #evaluate(int)} for every index and assembles with
 * {@link #result(Collection)} give the same result bit for bit, whatever the thread count, the
 * number of machines or the order. (The examples module runs the same study on Apache Spark.)
 *
 * <p><b>Failures.</b> A sample whose structure cannot be built or whose solve fails is kept with its
 * reason and counted ({@link ToleranceStudyResult#failures()}); statistics leave it out and say how
 * many they left out.
 *
 * <p>A built study is immutable and thread-safe, and may be run several times.
 */
public final class ToleranceStudy {
    private final Structure template;
    private final List<Tolerance> tolerances;
    private final int[] layerIndex;
    private final SampleDesign design;
    private final List<PointEvaluator> evaluators;
    private final List<Column> outputs;
    private final SelfConsistentSolver solver;
    private final int threads;
    private final ProgressListener progress;
    private final boolean defaultLattice;

    private ToleranceStudy(Builder b) {
        this.template = b.template;
        this.tolerances = List.copyOf(b.tolerances);
        if (tolerances.isEmpty()) {
            throw new InvalidParameterException("number of tolerances", "0", "[1, ...) (add a tolerance)");
        }
        this.layerIndex = new int[tolerances.size()];
        boolean bandOffset = false;
        boolean alnEv = false;
        List<UncertainInput> inputs = new ArrayList<>();
        for (int i = 0; i < tolerances.size(); i++) {
            Tolerance t = tolerances.get(i);
            layerIndex[i] = t.check(template);
            bandOffset |= t.kind() == Tolerance.Kind.CONDUCTION_BAND_OFFSET_FRACTION;
            alnEv |= t.kind() == Tolerance.Kind.MATERIAL_VALUE && t.binary() == Binary.ALN
                    && t.parameter() == MaterialParameter.VALENCE_BAND_EDGE;
            inputs.add(t.input());
        }
        if (bandOffset && alnEv) {
            throw new InvalidParameterException("tolerances on the AlN valence-band edge", "2 (AlN_Ev and "
                    + "conduction_band_offset_fraction)", "at most 1 (both set E_v of AlN)");
        }
        this.design = new SampleDesign(inputs, b.samples, b.plan, b.seed, b.sensitivity);
        this.evaluators = List.copyOf(b.evaluators);
        List<Column> cols = new ArrayList<>();
        for (PointEvaluator e : evaluators) {
            cols.addAll(e.columns());
        }
        this.outputs = List.copyOf(cols);
        this.solver = b.run.solver();
        this.threads = b.run.threads();
        this.progress = b.run.progress();
        Layer bottom = template.layersBottomUp().get(0);
        this.defaultLattice = template.referenceLatticeA() == bottom.material().at(0, template.parameters()).latticeA();
        double[] nominal = new double[tolerances.size()];
        for (int i = 0; i < nominal.length; i++) {
            nominal[i] = tolerances.get(i).distribution().mean();
        }
        structure(nominal); // fails early if even the nominal recipe cannot be built
    }

    /**
     * @param template the nominal structure; every sample is this structure with the tolerances'
     *                 draws applied
     * @return a builder
     */
    public static Builder builder(Structure template) {
        return new Builder(template);
    }

    /** @return the template */
    public Structure template() {
        return template;
    }

    /** @return the tolerances, in input order */
    public List<Tolerance> tolerances() {
        return tolerances;
    }

    /** @return the sample design (inputs, count, plan, seed, Sobol layout) */
    public SampleDesign design() {
        return design;
    }

    /** @return the output columns, those of every evaluator in order */
    public List<Column> outputs() {
        return outputs;
    }

    /** @return the number of evaluations, {@link SampleDesign#evaluations()} */
    public int size() {
        return design.evaluations();
    }

    /**
     * @param evaluation an evaluation index
     * @return its structure: the template with that evaluation's draws applied
     */
    public Structure structure(int evaluation) {
        return structure(design.values(evaluation));
    }

    /**
     * Computes one evaluation alone: the same numbers as in {@link #run()}, on any thread or machine.
     *
     * @param evaluation an evaluation index in [0, {@link #size()})
     * @return its outputs, or its failure
     */
    public Evaluation evaluate(int evaluation) {
        Require.inRange("evaluation index", evaluation, 0, size() - 1);
        try {
            return Evaluation.of(evaluation, compute(evaluation));
        } catch (InvalidParameterException | WurtzkitException e) {
            // a library failure of this sample is recorded with its kind; anything else is a bug
            return Evaluation.failed(evaluation, PointFailure.Reason.of(e));
        }
    }

    /**
     * Runs every evaluation on the study's threads. Blocks until done.
     *
     * @return the result
     * @throws java.util.concurrent.CancellationException if the calling thread is interrupted
     */
    public ToleranceStudyResult run() {
        @SuppressWarnings("unchecked")
        List<Warning>[] pointWarnings = new List[size()]; // each slot written by the one worker of its evaluation
        ParallelPoints.Outcome[] out = ParallelPoints.run(size(), threads, j -> {
            Computed c = computeWithWarnings(j);
            pointWarnings[j] = c.warnings();
            return c.values();
        }, progress);
        return ToleranceStudyResult.of(design, outputs, out).withOrigin(origin(), pointWarnings);
    }

    /** {@return what a result's provenance records of this study} */
    private ToleranceStudyResult.Origin origin() {
        List<String> tol = tolerances.stream().map(Tolerance::toString).toList();
        List<String> ev = evaluators.stream().map(PointEvaluator::description).toList();
        return new ToleranceStudyResult.Origin(template, solver.options(), tol, ev);
    }

    /**
     * Assembles evaluations computed elsewhere (e.g. {@link #evaluate(int)} in Spark tasks).
     *
     * @param evaluations one per index
     * @return the result, identical to {@link #run()}'s
     */
    public ToleranceStudyResult result(Collection<Evaluation> evaluations) {
        return ToleranceStudyResult.of(design, outputs, evaluations).withOrigin(origin(), null);
    }

    /** The outputs of one evaluation with the warnings of its evaluators. */
    private record Computed(double[] values, List<Warning> warnings) {
    }

    private double[] compute(int evaluation) {
        return computeWithWarnings(evaluation).values();
    }

    private Computed computeWithWarnings(int evaluation) {
        Structure s = structure(evaluation);
        double[] out = new double[outputs.size()];
        List<Warning> warnings = List.of();
        int at = 0;
        for (PointEvaluator e : evaluators) {
            PointEvaluator.Evaluated r = e.evaluateWithWarnings(s, solver);
            double[] v = r == null ? null : r.values();
            if (r != null) {
                warnings = Warning.union(warnings, r.warnings());
            }
            int w = e.columns().size();
            if (v == null || v.length != w) {
                throw new IllegalStateException("the evaluator returned " + (v == null ? "null" : v.length + " values")
                        + ", expected " + w);
            }
            System.arraycopy(v, 0, out, at, w);
            at += w;
        }
        return new Computed(out, warnings);
    }

    /**
     * @param x one value per tolerance
     * @return the template with those values applied
     */
    Structure structure(double[] x) {
        List<Layer> layers = new ArrayList<>(template.layersBottomUp());
        TopBoundary top = template.top();
        double temperature = template.temperatureK();
        double[][] overrides = null;
        double bandOffset = Double.NaN;
        for (int i = 0; i < x.length; i++) {
            Tolerance t = tolerances.get(i);
            double v = x[i];
            int li = layerIndex[i];
            switch (t.kind()) {
                case LAYER_THICKNESS -> layers.set(li, layers.get(li).withThickness(v * Units.NM));
                case AL_FRACTION -> {
                    Layer l = layers.get(li);
                    double indium = ((LayerMaterial.Alloy) l.material()).composition().indium();
                    layers.set(li, new Layer(l.name(), new LayerMaterial.Alloy(new Composition(v, indium)), l.thickness(),
                            l.dopants(), l.deepLevels(), l.deltaSheets(), l.relaxation()));
                }
                case DONOR_DENSITY -> {
                    Layer l = layers.get(li);
                    List<Dopant> dopants = new ArrayList<>();
                    for (Dopant d : l.dopants()) {
                        dopants.add(d.kind() == Dopant.Kind.DONOR
                                ? new Dopant(Dopant.Kind.DONOR, v * 1e6, d.ionizationEnergyEv(), d.degeneracy(),
                                        d.ionization())
                                : d);
                    }
                    layers.set(li, new Layer(l.name(), l.material(), l.thickness(), dopants, l.deepLevels(),
                            l.deltaSheets(), l.relaxation()));
                }
                case TEMPERATURE -> temperature = v;
                case GATE_BARRIER -> top = new TopBoundary.Schottky(v, ((TopBoundary.Schottky) top).biasV());
                case SURFACE_DONOR_LEVEL -> top = new TopBoundary.FreeSurface(v,
                        ((TopBoundary.FreeSurface) top).donorDensityPerM2());
                case MATERIAL_VALUE -> {
                    overrides = overrides == null ? emptyOverrides() : overrides;
                    overrides[t.binary().ordinal()][t.parameter().ordinal()] = v;
                }
                case CONDUCTION_BAND_OFFSET_FRACTION -> bandOffset = v;
                default -> throw new IllegalStateException(t.kind().toString());
            }
        }
        ParameterSet base = template.parameters();
        BandAlignment alignment = template.bandAlignment();
        if (!Double.isNaN(bandOffset) && alignment instanceof BandAlignment.ConductionBandFraction) {
            // the template lines up by a fraction: vary that fraction itself
            alignment = BandAlignment.conductionBandFraction(bandOffset);
        } else if (!Double.isNaN(bandOffset)) {
            overrides = overrides == null ? emptyOverrides() : overrides;
            double evGaN = value(base, overrides, Binary.GAN, MaterialParameter.VALENCE_BAND_EDGE);
            double gapGaN = value(base, overrides, Binary.GAN, MaterialParameter.BAND_GAP_0K);
            double gapAlN = value(base, overrides, Binary.ALN, MaterialParameter.BAND_GAP_0K);
            overrides[Binary.ALN.ordinal()][MaterialParameter.VALENCE_BAND_EDGE.ordinal()] = evGaN
                    - (1 - bandOffset) * (gapAlN - gapGaN);
        }
        ParameterSet set = overrides == null ? base : new PerturbedParameterSet(base, overrides);
        Structure.Builder b = Structure.builder(set);
        layers.forEach(b::grow);
        if (!defaultLattice) {
            b.onInPlaneLattice(template.referenceLatticeA());
        }
        return b.polarity(template.polarity())
                .polarizationModel(template.polarizationModel())
                .bandAlignment(alignment)
                .strainShiftsBandEdges(template.strainShiftsBandEdges())
                .strainShiftsValenceSplittings(template.strainShiftsValenceSplittings())
                .criticalThicknessModel(template.criticalThicknessModel())
                .temperatureK(temperature)
                .top(top)
                .bottom(template.bottom())
                .build();
    }

    private static double[][] emptyOverrides() {
        double[][] o = new double[Binary.values().length][MaterialParameter.values().length];
        for (double[] row : o) {
            java.util.Arrays.fill(row, Double.NaN);
        }
        return o;
    }

    private static double value(ParameterSet base, double[][] overrides, Binary b, MaterialParameter p) {
        double o = overrides[b.ordinal()][p.ordinal()];
        return Double.isNaN(o) ? base.binary(b).get(p) : o;
    }

    @Override
    public String toString() {
        return "ToleranceStudy[" + design + ", outputs " + outputs.stream().map(Column::header).toList() + ", " + threads
                + " threads]";
    }

    /** Mutable builder. */
    public static final class Builder {
        private final Structure template;
        private final List<Tolerance> tolerances = new ArrayList<>();
        private int samples = 1000;
        private SamplingPlan plan = SamplingPlan.MONTE_CARLO;
        private long seed = 1L;
        private boolean sensitivity;
        private List<PointEvaluator> evaluators = List.of(PointEvaluator.solve(Quantity.SHEET_DENSITY));
        private RunSettings run = RunSettings.defaults();

        private Builder(Structure template) {
            this.template = Require.nonNull("template structure", template);
        }

        /**
         * @param t the next tolerance (input order = order of these calls)
         * @return this builder
         */
        public Builder tolerance(Tolerance t) {
            tolerances.add(Require.nonNull("tolerance", t));
            return this;
        }

        /**
         * @param n number of sample rows, &ge; 2 (default 1000); with {@link #sensitivity(boolean)}
         *          the study runs n (k + 2) evaluations for k tolerances
         * @return this builder
         */
        public Builder samples(int n) {
            this.samples = n; // checked with the design, which knows the evaluation count
            return this;
        }

        /**
         * @param p the sampling plan (default {@link SamplingPlan#MONTE_CARLO})
         * @return this builder
         */
        public Builder plan(SamplingPlan p) {
            this.plan = Require.nonNull("sampling plan", p);
            return this;
        }

        /**
         * @param s the seed of every random number (default 1)
         * @return this builder
         */
        public Builder seed(long s) {
            this.seed = s;
            return this;
        }

        /**
         * @param on whether to run the design of Saltelli et al. (2010) for Sobol indices (default
         *           false: n plain samples)
         * @return this builder
         */
        public Builder sensitivity(boolean on) {
            this.sensitivity = on;
            return this;
        }

        /**
         * One cold solve per sample, from which these quantities are read; replaces evaluators set
         * before (default: the sheet density).
         *
         * @param q the quantities
         * @return this builder
         */
        public Builder quantities(Quantity... q) {
            this.evaluators = List.of(PointEvaluator.solve(q));
            return this;
        }

        /**
         * What each sample computes; the outputs are the columns of the evaluators in order (e.g.
         * {@code PointEvaluator.solve(Quantity.SHEET_DENSITY)} and
         * {@code PointEvaluator.thresholdVoltage(extraction)}). Replaces quantities set before.
         *
         * @param e at least one evaluator
         * @return this builder
         */
        public Builder evaluators(PointEvaluator... e) {
            Require.nonNull("point evaluators", e);
            if (e.length == 0) {
                throw new InvalidParameterException("number of point evaluators", "0", "[1, ...)");
            }
            List<PointEvaluator> l = new ArrayList<>();
            for (PointEvaluator x : e) {
                l.add(Require.nonNull("point evaluator", x));
            }
            this.evaluators = List.copyOf(l);
            return this;
        }

        /**
         * @param s the solver (default {@link SelfConsistentSolver#SelfConsistentSolver()})
         * @return this builder
         */
        public Builder solver(SelfConsistentSolver s) {
            run = run.withSolver(s);
            return this;
        }

        /**
         * @param n worker threads of {@link ToleranceStudy#run()}, in [1, 1024] (default: all
         *          processors); the result does not depend on it
         * @return this builder
         */
        public Builder threads(int n) {
            run = run.withThreads(n);
            return this;
        }

        /**
         * @param p progress listener, called once per evaluation (default: none)
         * @return this builder
         */
        public Builder progress(ProgressListener p) {
            run = run.withProgress(p);
            return this;
        }

        /**
         * @return the study
         * @throws InvalidParameterException for no tolerance, a tolerance on a layer the template
         *                                   does not have, a distribution that leaves its
         *                                   parameter's range, or a bad sample count
         */
        public ToleranceStudy build() {
            return new ToleranceStudy(this);
        }
    }
}
