package dev.filmshear.solver.physics;

/**
 * Thermodynamic properties of compressed liquid water from the IAPWS Industrial Formulation 1997,
 * region 1.
 *
 * <p>Source: IAPWS R7-97(2012), <i>Revised Release on the IAPWS Industrial Formulation 1997 for the
 * Thermodynamic Properties of Water and Steam</i>, Eq. 7 with Table 2 (coefficients) and Table 3
 * (property relations); W. Wagner et al., <i>J. Eng. Gas Turbines Power</i> 122 (2000) 150-184.
 * Range: 273.15 K &lt;= T &lt;= 623.15 K and p_s(T) &lt;= p &lt;= 100 MPa.
 *
 * <p>Mathematics. The dimensionless Gibbs free energy, with pi = p / 16.53 MPa and tau = 1386 K / T, is
 * <pre>
 *   gamma(pi, tau) = g / (R T) = sum_i n_i (7.1 - pi)^I_i (tau - 1.222)^J_i      (34 terms)
 * </pre>
 * and every property follows from its derivatives (subscripts denote partial derivatives):
 * <pre>
 *   v   = R T gamma_pi / p*                  h   = R T tau gamma_tau
 *   u   = R T (tau gamma_tau - pi gamma_pi)  s   = R (tau gamma_tau - gamma)
 *   c_p = -R tau^2 gamma_tautau
 *   c_v = R (-tau^2 gamma_tautau + (gamma_pi - tau gamma_pitau)^2 / gamma_pipi)
 *   w^2 = R T gamma_pi^2 / ((gamma_pi - tau gamma_pitau)^2 / (tau^2 gamma_tautau) - gamma_pipi)
 *   alpha_v = (1 - tau gamma_pitau / gamma_pi) / T      kappa_T = -pi gamma_pipi / (p gamma_pi)
 * </pre>
 * Neither of the project's numerical libraries (EJML, Apache Commons Math) provides water properties,
 * so the formulation is typed in here from the release; the tests reproduce the release's Table 5.
 *
 * <p>All arguments and results are SI: T in K, p in Pa, v in m^3/kg, energies in J/kg, entropies and
 * heat capacities in J/(kg K). The methods do not check the range; outside it the formula is extrapolated.
 */
public final class Iapws97Region1 {

    /** Specific gas constant of water in IF97 (J/(kg K)). */
    public static final double GAS_CONSTANT = 461.526;
    /** Reducing pressure p* (Pa). */
    private static final double P_STAR = 16.53e6;
    /** Reducing temperature T* (K). */
    private static final double T_STAR = 1386;

    /** IAPWS R7-97(2012) Table 2: exponents I_i. */
    private static final int[] I = {
        0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32,
    };
    /** IAPWS R7-97(2012) Table 2: exponents J_i. */
    private static final int[] J = {
        -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31,
        -38, -39, -40, -41,
    };
    /** IAPWS R7-97(2012) Table 2: coefficients n_i. */
    private static final double[] N = {
        0.14632971213167, -0.84548187169114, -0.37563603672040e1, 0.33855169168385e1, -0.95791963387872,
        0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3, -0.60706301565874e-3,
        -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1, -0.52838357969930e-4,
        -0.47184321073267e-3, -0.30001780793026e-3, 0.47661393906987e-4, -0.44141845330846e-5,
        -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5, -0.85205128120103e-9,
        -0.22425281908000e-5, -0.65171222895601e-6, -0.14341729937924e-12, -0.40516996860117e-6,
        -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18, 0.14478307828521e-19,
        0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23, -0.93537087292458e-25,
    };

    private Iapws97Region1() {
    }

    /** Specific volume v (m^3/kg). */
    public static double specificVolume(double temperature, double pressure) {
        return GAS_CONSTANT * temperature * gammaPi(pressure / P_STAR, T_STAR / temperature) / P_STAR;
    }

    /** Density rho = 1 / v (kg/m^3). */
    public static double density(double temperature, double pressure) {
        return 1 / specificVolume(temperature, pressure);
    }

    /** Specific enthalpy h (J/kg). */
    public static double enthalpy(double temperature, double pressure) {
        double tau = T_STAR / temperature;
        return GAS_CONSTANT * temperature * tau * gammaTau(pressure / P_STAR, tau);
    }

    /** Specific internal energy u (J/kg). */
    public static double internalEnergy(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        return GAS_CONSTANT * temperature * (tau * gammaTau(pi, tau) - pi * gammaPi(pi, tau));
    }

    /** Specific entropy s (J/(kg K)). */
    public static double entropy(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        return GAS_CONSTANT * (tau * gammaTau(pi, tau) - gamma(pi, tau));
    }

    /** Specific isobaric heat capacity c_p (J/(kg K)). */
    public static double specificHeat(double temperature, double pressure) {
        double tau = T_STAR / temperature;
        return -GAS_CONSTANT * tau * tau * gammaTauTau(pressure / P_STAR, tau);
    }

    /** Specific isochoric heat capacity c_v (J/(kg K)). */
    public static double isochoricHeat(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        double cross = gammaPi(pi, tau) - tau * gammaPiTau(pi, tau);
        return GAS_CONSTANT * (-tau * tau * gammaTauTau(pi, tau) + cross * cross / gammaPiPi(pi, tau));
    }

    /** Speed of sound w (m/s). */
    public static double speedOfSound(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        double gPi = gammaPi(pi, tau);
        double cross = gPi - tau * gammaPiTau(pi, tau);
        double denominator = cross * cross / (tau * tau * gammaTauTau(pi, tau)) - gammaPiPi(pi, tau);
        return Math.sqrt(GAS_CONSTANT * temperature * gPi * gPi / denominator);
    }

    /** Isobaric cubic expansion coefficient alpha_v = (1/v) (dv/dT)_p (1/K). */
    public static double isobaricExpansivity(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        return (1 - tau * gammaPiTau(pi, tau) / gammaPi(pi, tau)) / temperature;
    }

    /** Isothermal compressibility kappa_T = -(1/v) (dv/dp)_T (1/Pa). */
    public static double isothermalCompressibility(double temperature, double pressure) {
        double pi = pressure / P_STAR;
        double tau = T_STAR / temperature;
        return -pi * gammaPiPi(pi, tau) / (pressure * gammaPi(pi, tau));
    }

    private static double gamma(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            sum += N[i] * Math.pow(x, I[i]) * Math.pow(y, J[i]);
        }
        return sum;
    }

    private static double gammaPi(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            if (I[i] != 0) {
                sum -= N[i] * I[i] * Math.pow(x, I[i] - 1) * Math.pow(y, J[i]);
            }
        }
        return sum;
    }

    private static double gammaPiPi(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            if (I[i] > 1) {
                sum += N[i] * I[i] * (I[i] - 1) * Math.pow(x, I[i] - 2) * Math.pow(y, J[i]);
            }
        }
        return sum;
    }

    private static double gammaTau(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            if (J[i] != 0) {
                sum += N[i] * Math.pow(x, I[i]) * J[i] * Math.pow(y, J[i] - 1);
            }
        }
        return sum;
    }

    private static double gammaTauTau(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            if (J[i] != 0 && J[i] != 1) {
                sum += N[i] * Math.pow(x, I[i]) * J[i] * (J[i] - 1) * Math.pow(y, J[i] - 2);
            }
        }
        return sum;
    }

    private static double gammaPiTau(double pi, double tau) {
        double x = 7.1 - pi;
        double y = tau - 1.222;
        double sum = 0;
        for (int i = 0; i < N.length; i++) {
            if (I[i] != 0 && J[i] != 0) {
                sum -= N[i] * I[i] * Math.pow(x, I[i] - 1) * J[i] * Math.pow(y, J[i] - 1);
            }
        }
        return sum;
    }
}
