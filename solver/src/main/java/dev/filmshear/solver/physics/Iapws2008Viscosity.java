package dev.filmshear.solver.physics;

/**
 * Viscosity of ordinary water from the IAPWS Formulation 2008, for industrial use (no critical
 * enhancement).
 *
 * <p>Sources: IAPWS R12-08 (2008), <i>Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 * Water Substance</i>; M. L. Huber et al., "New international formulation for the viscosity of H2O",
 * <i>J. Phys. Chem. Ref. Data</i> 38 (2009) 101-125, Eqs. 10-12 with Tables 2 and 3.
 *
 * <p>Mathematics, with T* = 647.096 K, rho* = 322 kg/m^3, mu* = 1e-6 Pa s and reduced variables
 * Tr = T / T*, rhor = rho / rho*:
 * <pre>
 *   mu / mu* = mu0(Tr) * mu1(Tr, rhor) * mu2(Tr, rhor)
 *   mu0 = 100 sqrt(Tr) / sum_{i=0..3} H_i / Tr^i
 *   mu1 = exp[ rhor * sum_{i=0..5} (1/Tr - 1)^i * sum_{j=0..6} H_ij (rhor - 1)^j ]
 *   mu2 = 1
 * </pre>
 * The critical enhancement mu2 is set to 1, as IAPWS recommends for industrial use: it matters only
 * within a few kelvin and some tens of kg/m^3 of the critical point, far from any lubricating film.
 * The sums are evaluated by Horner's rule. Neither EJML nor Apache Commons Math provides water
 * properties, so the formulation is typed in here; the tests reproduce the release's Table 4.
 */
public final class Iapws2008Viscosity {

    private static final double T_STAR = 647.096;
    private static final double RHO_STAR = 322.0;
    private static final double MU_STAR = 1.0e-6;

    /** Huber et al. (2009) Table 2: H_0..H_3 of the dilute-gas term. */
    private static final double[] H = {1.67752, 2.20462, 0.6366564, -0.241605};

    /**
     * Huber et al. (2009) Table 3: H_ij of the residual term, indexed [i][j] with i the temperature
     * index (0..5) and j the density index (0..6); the entries not listed there are zero.
     */
    private static final double[][] HIJ = {
        {5.20094e-1, 2.22531e-1, -2.81378e-1, 1.61913e-1, -3.25372e-2, 0, 0},
        {8.50895e-2, 9.99115e-1, -9.06851e-1, 2.57399e-1, 0, 0, 0},
        {-1.08374, 1.88797, -7.72479e-1, 0, 0, 0, 0},
        {-2.89555e-1, 1.26613, -4.89837e-1, 0, 6.98452e-2, 0, -4.35673e-3},
        {0, 0, -2.57040e-1, 0, 0, 8.72102e-3, 0},
        {0, 1.20573e-1, 0, 0, 0, 0, -5.93264e-4},
    };

    private Iapws2008Viscosity() {
    }

    /**
     * Dynamic viscosity (Pa s) of water at temperature {@code temperature} (K) and density
     * {@code density} (kg/m^3), with mu2 = 1.
     */
    public static double viscosity(double temperature, double density) {
        double t = temperature / T_STAR;
        double rho = density / RHO_STAR;

        double dilute = H[0] + (H[1] + (H[2] + H[3] / t) / t) / t;
        double mu0 = 100 * Math.sqrt(t) / dilute;

        double x = 1 / t - 1;
        double y = rho - 1;
        double outer = 0;
        for (int i = HIJ.length - 1; i >= 0; i--) {
            double[] row = HIJ[i];
            double inner = 0;
            for (int j = row.length - 1; j >= 0; j--) {
                inner = inner * y + row[j];
            }
            outer = outer * x + inner;
        }
        double mu1 = Math.exp(rho * outer);
        return MU_STAR * mu0 * mu1;
    }
}
