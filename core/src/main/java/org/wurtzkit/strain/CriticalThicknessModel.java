package org.wurtzkit.strain;

import org.wurtzkit.material.ElasticConstants;
import org.wurtzkit.material.WurtziteMaterial;

/**
 * A model of the thickness beyond which a pseudomorphic c-plane layer starts to relax. Used as a
 * warning threshold ({@code Structure.layersBeyondCriticalThickness}); all models are estimates.
 *
 * <ul>
 * <li>{@link #C_PLANE_WURTZITE} (the default, {@link CPlaneWurtzite}): a layer under tension (AlGaN
 * or AlN on GaN) relaxes first by surface fracture, observed for all 0.14 &le; x &le; 1 by in-situ
 * wafer curvature (S. R. Lee et al., Appl. Phys. Lett. 85, 6164 (2004)), so it uses the
 * channel-crack criterion {@link ChannelCracking}; a layer under compression (InGaN on GaN) cannot
 * crack and uses Matthews-Blakeslee for a+c dislocations on the pyramidal planes
 * ({@link PyramidalSlip}, D. Holec et al., J. Cryst. Growth 303, 314 (2007)).</li>
 * <li>{@link CriticalThickness#MATTHEWS_BLAKESLEE_60}: the zinc-blende 60-degree geometry, the
 * library's former default, kept for comparison (2-5x too pessimistic for AlGaN on GaN).</li>
 * </ul>
 */
public sealed interface CriticalThicknessModel
        permits CriticalThickness, CriticalThicknessModel.PyramidalSlip, CriticalThicknessModel.ChannelCracking,
        CriticalThicknessModel.CPlaneWurtzite {

    /**
     * @param layer  the layer's material
     * @param strain its strain
     * @return the critical thickness (m); +infinity when the model predicts no relaxation (unstrained,
     *         or compressed for the cracking criterion)
     */
    double of(WurtziteMaterial layer, Strain strain);

    /** The default: cracking under tension, pyramidal slip under compression. */
    CPlaneWurtzite C_PLANE_WURTZITE = new CPlaneWurtzite(new PyramidalSlip(), ChannelCracking.EINFELDT_2000);

    /**
     * Matthews-Blakeslee (J. W. Matthews and A. E. Blakeslee, J. Cryst. Growth 27, 118 (1974)) for
     * misfit dislocations with Burgers vector a+c, 1/3&lt;11-23&gt;, gliding on the {11-22} pyramidal
     * planes: the slip system that has a resolved shear stress under biaxial c-plane stress, used
     * for c-plane wurtzite by D. Holec, P. M. F. J. Costa, M. J. Kappers and C. J. Humphreys, J. Cryst.
     * Growth 303, 314 (2007) and observed in InGaN/GaN (Srinivasan et al., phys. stat. sol. (c) 2003).
     * The dislocation line runs along &lt;1-100&gt; in the interface, perpendicular to both a and c, so
     * the dislocation is pure edge (cos alpha = 0), b = sqrt(a&sup2; + c&sup2;) and the in-plane
     * component of b normal to the line gives cos lambda = a/b (geometry worked out here):
     *
     * <pre>
     *   h_c = b / (8 pi f (1 + nu) cos lambda) * [ln(h_c / b) + 1]
     * </pre>
     *
     * with f = |eps_xx| and nu = C13/(C13 + C33). It gives 24 nm for Al0.3Ga0.7N on GaN with the
     * default set, an equilibrium lower bound that grown layers exceed (metastability).
     */
    record PyramidalSlip() implements CriticalThicknessModel {
        @Override
        public double of(WurtziteMaterial layer, Strain strain) {
            double f = Math.abs(strain.xx());
            if (f == 0) {
                return Double.POSITIVE_INFINITY;
            }
            double a = layer.latticeA();
            double c = layer.latticeC();
            double b = Math.sqrt(a * a + c * c);
            double cosLambda = a / b;
            double nu = layer.elastic().poissonRatio();
            return CriticalThickness.solve(b / (8 * Math.PI * f * (1 + nu) * cosLambda), b);
        }
    }

    /**
     * Channel cracking of a film under biaxial tension (J. W. Hutchinson and Z. Suo, Adv. Appl. Mech.
     * 29, 63 (1992)): a surface crack channels through the film once its energy release rate
     * G = Z sigma&sup2; h / E' reaches the fracture resistance Gamma, so
     *
     * <pre>
     *   h_c = Gamma E' / (Z sigma&sup2;),   sigma = M eps_xx,   M = C11 + C12 - 2 C13&sup2;/C33
     * </pre>
     *
     * with Z = {@value #Z_CHANNEL} for a film on a substrate of similar stiffness (from memory) and
     * E' = E/(1 - nu&sup2;) the plane-strain modulus from the in-plane Young's modulus and Poisson
     * ratio of the hexagonal compliance (an isotropic approximation for the crack cross-section,
     * common practice, no source). A layer under compression never cracks (+infinity).
     *
     * @param fractureResistanceJPerM2 Gamma (J/m&sup2;), in (0, 1000]
     */
    record ChannelCracking(double fractureResistanceJPerM2) implements CriticalThicknessModel {
        /** Dimensionless energy-release coefficient of a channel crack, film and substrate alike. */
        public static final double Z_CHANNEL = 1.976;

        /**
         * Gamma = 9 J/m&sup2;, fitted to the onsets of crack channelling in Al<sub>x</sub>Ga<sub>1-x</sub>N
         * on GaN by S. Einfeldt et al., J. Appl. Phys. 88, 7029 (2000) (value verified in the abstract).
         */
        public static final ChannelCracking EINFELDT_2000 = new ChannelCracking(9);

        /** Validates Gamma. */
        public ChannelCracking {
            if (!(fractureResistanceJPerM2 > 0 && fractureResistanceJPerM2 <= 1000)) {
                throw new org.wurtzkit.errors.InvalidParameterException("fracture resistance Gamma (J/m^2)",
                        Double.toString(fractureResistanceJPerM2), "(0, 1000]");
            }
        }

        @Override
        public double of(WurtziteMaterial layer, Strain strain) {
            if (!(strain.xx() > 0)) {
                return Double.POSITIVE_INFINITY;
            }
            ElasticConstants e = layer.elastic();
            double sigma = biaxialModulus(e) * strain.xx();
            return fractureResistanceJPerM2 * planeStrainModulus(e) / (Z_CHANNEL * sigma * sigma);
        }

        /**
         * @param e stiffness constants (Pa)
         * @return the biaxial modulus M = C11 + C12 - 2 C13&sup2;/C33 (Pa): in-plane stress per unit
         *         in-plane strain of a c-plane layer free along c
         */
        public static double biaxialModulus(ElasticConstants e) {
            return e.c11() + e.c12() - 2 * e.c13() * e.c13() / e.c33();
        }

        /**
         * @param e stiffness constants (Pa)
         * @return E/(1 - nu&sup2;) (Pa) with the in-plane Young's modulus E = 1/S11 and Poisson ratio
         *         nu = -S12/S11 of the hexagonal compliance S = C^-1
         */
        public static double planeStrainModulus(ElasticConstants e) {
            double det = (e.c11() - e.c12()) * (e.c33() * (e.c11() + e.c12()) - 2 * e.c13() * e.c13());
            double s11 = (e.c11() * e.c33() - e.c13() * e.c13()) / det;
            double s12 = -(e.c12() * e.c33() - e.c13() * e.c13()) / det;
            double young = 1 / s11;
            double nu = -s12 / s11;
            return young / (1 - nu * nu);
        }
    }

    /**
     * The c-plane wurtzite model: {@code cracking} for a layer under tension (eps_xx &gt; 0),
     * {@code slip} for one under compression.
     *
     * @param slip     the dislocation model for compressed layers
     * @param cracking the fracture model for layers under tension
     */
    record CPlaneWurtzite(CriticalThicknessModel slip, ChannelCracking cracking) implements CriticalThicknessModel {
        /** Validates the parts. */
        public CPlaneWurtzite {
            org.wurtzkit.errors.Require.nonNull("slip model", slip);
            org.wurtzkit.errors.Require.nonNull("cracking model", cracking);
        }

        @Override
        public double of(WurtziteMaterial layer, Strain strain) {
            return strain.xx() > 0 ? cracking.of(layer, strain) : slip.of(layer, strain);
        }
    }
}
