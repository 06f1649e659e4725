package dev.filmshear.validation.analytic;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.validation.analytic.GapResponses.Form;

/**
 * Thermal start-up of a film with a uniform volumetric heat source S (for example the dissipation
 * mu (U/h)^2 of a Couette flow held steady), both walls held at T0 and the film at T0 at t = 0:
 * <pre>
 *   rho cp dT/dt = k d2T/dy2 + S,   T(0, t) = T(h, t) = T0,   T(y, 0) = T0.
 * </pre>
 * With eta = y/h and tau_T = a t/h^2 (a = k/(rho cp)),
 * <pre>
 *   (T - T0) k / (S h^2) = eta (1 - eta)/2 - sum_{n odd} 4/(n^3 pi^3) exp(-n^2 pi^2 tau_T) sin(n pi eta)
 * </pre>
 * summed in this Fourier form for large tau_T and in the equivalent image form
 * tau_T - R(eta) - R(1 - eta), R(xi) = 4 tau_T sum [i2erfc((2n+xi)/(2 sqrt tau_T)) - i2erfc((2n+2-xi)/(2 sqrt tau_T))]
 * for small tau_T (H. S. Carslaw and J. C. Jaeger, <i>Conduction of Heat in Solids</i>, 2nd ed., 1959, §3.3).
 * The series and its check values were derived and checked for this project (references.md 7(f),
 * "Extra thermal start-up check", DERIVED+CHECKED).
 *
 * @param gap h (m)
 * @param conductivity k (W/(m K))
 * @param diffusivity a = k/(rho cp) (m^2/s)
 * @param source S (W/m^3)
 * @param wallTemperature T0 (K), also the initial temperature
 */
public record HeatedFilmStartup(double gap, double conductivity, double diffusivity, double source,
                                double wallTemperature) {

    public HeatedFilmStartup {
        InvalidParameterException.requirePositive("gap", gap, "m");
        InvalidParameterException.requirePositive("conductivity", conductivity, "W/(m*K)");
        InvalidParameterException.requirePositive("diffusivity", diffusivity, "m^2/s");
        InvalidParameterException.requireFinite("source", source, "W/m^3");
        InvalidParameterException.requirePositive("temperature", wallTemperature, "K");
    }

    /** The dimensionless rise (T - T0) k / (S h^2) at {@code eta} = y/h and {@code tau} = a t/h^2 (&gt; 0, or
     * +infinity for the steady profile eta (1 - eta)/2). */
    public static double dimensionlessRise(double eta, double tau) {
        if (!(eta >= 0 && eta <= 1)) {
            throw new InvalidParameterException("eta", Double.toString(eta), "0 to 1");
        }
        if (!(tau > 0)) {
            throw new InvalidParameterException("tau", Double.toString(tau), "above 0");
        }
        if (tau == Double.POSITIVE_INFINITY) {
            return eta * (1 - eta) / 2;
        }
        return GapResponses.forcing(Quantity.VALUE, eta, tau, Form.at(tau));
    }

    /** The thermal diffusion time h^2 / a (s). */
    public double diffusionTime() {
        return gap * gap / diffusivity;
    }

    /** Temperature (K) at height {@code y} (m) and time {@code t} (s, above zero; +infinity for steady). */
    public double temperature(double y, double t) {
        Checks.inGap(y, gap);
        Checks.time(t > 0, t, "above 0 s, or +infinity for the steady state");
        return wallTemperature + source * gap * gap / conductivity * dimensionlessRise(y / gap, t / diffusionTime());
    }

    /** Heat flux (W/m^2) from the film into each wall at time {@code t} (s): k dT/dy at y = 0. */
    public double heatFluxIntoEachWall(double t) {
        Checks.time(t > 0, t, "above 0 s, or +infinity for the steady state");
        if (t == Double.POSITIVE_INFINITY) {
            return source * gap / 2;
        }
        double tau = t / diffusionTime();
        return source * gap * GapResponses.forcing(Quantity.SLOPE, 0, tau, Form.at(tau));
    }

    /** Heat stored in the film per unit wall area (J/m^2) at time {@code t} (s): rho cp integral (T - T0) dy. */
    public double storedHeat(double t) {
        Checks.time(t > 0, t, "above 0 s, or +infinity for the steady state");
        double mean = t == Double.POSITIVE_INFINITY ? 1.0 / 12
                : GapResponses.forcing(Quantity.MEAN, 0, t / diffusionTime(), Form.at(t / diffusionTime()));
        // rho cp (S h^2 / k) h mean, with rho cp = k / a
        return source * gap * gap * gap * mean / diffusivity;
    }
}
