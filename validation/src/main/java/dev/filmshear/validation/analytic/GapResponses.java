package dev.filmshear.validation.analytic;

import org.apache.commons.math3.complex.Complex;

import java.util.function.IntToDoubleFunction;

/**
 * Dimensionless building blocks of every constant-property film solution: responses f(xi, tau) of the
 * diffusion equation f_tau = f_xixi on 0 &lt;= xi &lt;= 1 (xi = y/h, tau = nu t / h^2), with f = 0 at
 * tau = 0 and f = 0 on the wall xi = 1, to
 * <ul>
 *   <li><b>step</b>: the wall xi = 0 held at 1 for tau &gt; 0 (the start-up of plane Couette flow);</li>
 *   <li><b>ramp</b>: the wall xi = 0 at f = tau; returned as the bounded deviation
 *       ramp(xi, tau) - (1 - xi) tau, so that long times do not subtract large numbers;</li>
 *   <li><b>forcing</b>: both walls at 0 and a uniform unit source, f_tau = f_xixi + 1;</li>
 *   <li><b>oscillation</b>: the wall xi = 0 at sin(kappa tau + phase) for tau &gt; 0, kappa = omega h^2 / nu,
 *       split into its periodic part and the transient that makes f vanish at tau = 0.</li>
 * </ul>
 *
 * <p>Each is given in two forms that converge at opposite ends of time.
 * <b>Images</b> (fast for small tau; H. S. Carslaw and J. C. Jaeger, <i>Conduction of Heat in Solids</i>,
 * 2nd ed., 1959, §3.3), with s = 2 sqrt(tau):
 * <pre>
 *   step(xi)  = sum_{n&gt;=0} [ erfc((2n+xi)/s) - erfc((2n+2-xi)/s) ]
 *   ramp(xi)  = 4 tau sum_{n&gt;=0} [ i2erfc((2n+xi)/s) - i2erfc((2n+2-xi)/s) ]
 *   forcing   = tau - ramp(xi) - ramp(1-xi)
 * </pre>
 * <b>Fourier</b> (fast for large tau; R. B. Bird, W. E. Stewart and E. N. Lightfoot, <i>Transport
 * Phenomena</i>, 2nd ed., 2002, §4.1), with E_n = exp(-n^2 pi^2 tau):
 * <pre>
 *   step(xi)  = (1 - xi) - (2/pi) sum 1/n E_n sin(n pi xi)
 *   ramp(xi)  = (1 - xi) tau - xi (1-xi)(2-xi)/6 + (2/pi^3) sum 1/n^3 E_n sin(n pi xi)
 *   forcing   = xi (1 - xi)/2 - sum_{n odd} 4/(n^3 pi^3) E_n sin(n pi xi)
 *   oscillation = Im{ e^{i(kappa tau + phase)} sinh(m(1-xi))/sinh(m) } - sum Im{ e^{i phase} b_n } E_n sin(n pi xi),
 *       m = sqrt(i kappa),  b_n = 2 n pi / (n^2 pi^2 + i kappa)
 * </pre>
 * The ramp is the time integral of the step (Duhamel's principle); the coefficients b_n are the sine
 * coefficients of the periodic profile at tau = 0 in closed form. The slope and mean over the gap of each
 * form are the term-by-term derivatives and integrals (using d/dz i^n erfc = -i^(n-1) erfc).
 */
final class GapResponses {
    /** Below this tau the image forms are used: their terms fall as exp(-n^2/tau), the Fourier terms as
     * exp(-n^2 pi^2 tau); at 0.1 each needs fewer than ten terms. */
    static final double IMAGE_FORM_BELOW = 0.1;

    /** Which series to sum. */
    enum Form {
        IMAGES, FOURIER;

        /** The faster-converging form at {@code tau}. */
        static Form at(double tau) {
            return tau < IMAGE_FORM_BELOW ? IMAGES : FOURIER;
        }
    }

    private GapResponses() {
    }

    /** Response to a unit step of the wall xi = 0. */
    static double step(Quantity q, double xi, double tau, Form form) {
        if (form == Form.IMAGES) {
            return images(q, 0, xi, tau, "step images");
        }
        return fourier(q, xi, tau, oneMinusXi(q, xi), n -> -2 / (n * Math.PI), false, "step Fourier series");
    }

    /** Response to a unit ramp of the wall xi = 0 (wall value tau), less (1 - xi) tau. */
    static double rampDeviation(Quantity q, double xi, double tau, Form form) {
        if (form == Form.IMAGES) {
            return images(q, 2, xi, tau, "ramp images") - tau * oneMinusXi(q, xi);
        }
        double linear;
        switch (q) {
            case VALUE:
                linear = -xi * (1 - xi) * (2 - xi) / 6;
                break;
            case SLOPE:
                linear = -(1.0 / 3 - xi + xi * xi / 2);
                break;
            default:
                linear = -1.0 / 24;
        }
        double c = 2 / (Math.PI * Math.PI * Math.PI);
        return fourier(q, xi, tau, linear, n -> c / ((double) n * n * n), false, "ramp Fourier series");
    }

    /** Response to a unit uniform source with both walls at zero. */
    static double forcing(Quantity q, double xi, double tau, Form form) {
        if (form == Form.IMAGES) {
            switch (q) {
                case VALUE:
                    return tau - images(q, 2, xi, tau, "forcing images") - images(q, 2, 1 - xi, tau, "forcing images");
                case SLOPE:
                    return -images(q, 2, xi, tau, "forcing images") + images(q, 2, 1 - xi, tau, "forcing images");
                default:
                    return tau - 2 * images(q, 2, xi, tau, "forcing images");
            }
        }
        double linear;
        switch (q) {
            case VALUE:
                linear = xi * (1 - xi) / 2;
                break;
            case SLOPE:
                linear = (1 - 2 * xi) / 2;
                break;
            default:
                linear = 1.0 / 12;
        }
        double c = -4 / (Math.PI * Math.PI * Math.PI);
        return fourier(q, xi, tau, linear, n -> c / ((double) n * n * n), true, "forcing Fourier series");
    }

    /** Periodic response Im{e^{i(kappa tau + phase)} P(xi)} to the wall xi = 0 at sin(kappa tau + phase). */
    static double oscillationPeriodic(Quantity q, double xi, double kappa, double tau, double phase) {
        Complex m = new Complex(1, 1).multiply(Math.sqrt(kappa / 2));
        Complex profile;
        switch (q) {
            case VALUE:
                profile = sinhRatio(m, xi);
                break;
            case SLOPE:
                profile = sinhRatioSlope(m, xi);
                break;
            default:
                // integral of sinh(m(1-xi))/sinh(m) over the gap = (cosh m - 1)/(m sinh m) = tanh(m/2)/m
                profile = m.divide(2).tanh().divide(m);
        }
        double angle = kappa * tau + phase;
        return profile.multiply(new Complex(Math.cos(angle), Math.sin(angle))).getImaginary();
    }

    /**
     * Transient part of the response to the wall xi = 0 at sin(kappa tau + phase) started at tau = 0 from rest:
     * the response less {@link #oscillationPeriodic}. Fourier form only: its coefficients are in closed form.
     */
    static double oscillationTransient(Quantity q, double xi, double kappa, double tau, double phase) {
        Complex start = new Complex(Math.cos(phase), Math.sin(phase));
        IntToDoubleFunction coefficient = n -> {
            double npi = n * Math.PI;
            Complex bn = new Complex(2 * npi, 0).divide(new Complex(npi * npi, kappa));
            return -start.multiply(bn).getImaginary();
        };
        IntToDoubleFunction magnitude = n -> {
            double npi = n * Math.PI;
            return 2 * npi / Math.hypot(npi * npi, kappa);
        };
        return fourier(q, xi, tau, 0, coefficient, magnitude, false, "oscillation transient Fourier series");
    }

    /** sinh(m (1 - xi)) / sinh(m), written with decaying exponentials when |m| is not small so that
     * large gaps (h much thicker than the Stokes layer) do not overflow. */
    static Complex sinhRatio(Complex m, double xi) {
        if (m.abs() < 1) {
            return m.multiply(1 - xi).sinh().divide(m.sinh());
        }
        Complex numerator = Complex.ONE.subtract(m.multiply(-2 * (1 - xi)).exp());
        Complex denominator = Complex.ONE.subtract(m.multiply(-2).exp());
        return m.multiply(-xi).exp().multiply(numerator).divide(denominator);
    }

    /** d/dxi of {@link #sinhRatio}: -m cosh(m (1 - xi)) / sinh(m). */
    static Complex sinhRatioSlope(Complex m, double xi) {
        if (m.abs() < 1) {
            return m.multiply(1 - xi).cosh().multiply(m).divide(m.sinh()).negate();
        }
        Complex numerator = Complex.ONE.add(m.multiply(-2 * (1 - xi)).exp());
        Complex denominator = Complex.ONE.subtract(m.multiply(-2).exp());
        return m.multiply(-xi).exp().multiply(numerator).multiply(m).divide(denominator).negate();
    }

    /** The quantity q of the profile 1 - xi. */
    static double oneMinusXi(Quantity q, double xi) {
        switch (q) {
            case VALUE:
                return 1 - xi;
            case SLOPE:
                return -1;
            default:
                return 0.5;
        }
    }

    /**
     * Image series: order 0 sums erfc (step), order 2 sums 4 tau i2erfc (ramp); the slope lowers the order
     * of i^n erfc by one, the mean raises it by one.
     */
    private static double images(Quantity q, int order, double xi, double tau, String what) {
        double s = 2 * Math.sqrt(tau);
        double scale = order == 0 ? 1 : 4 * tau;
        double sum = 0;
        for (int n = 0; ; n++) {
            double term;
            double envelope;
            switch (q) {
                case VALUE: {
                    double near = RepeatedErfc.of(order, (2 * n + xi) / s);
                    double far = RepeatedErfc.of(order, (2 * n + 2 - xi) / s);
                    term = near - far;
                    envelope = Math.abs(near);
                    break;
                }
                case SLOPE: {
                    double near = RepeatedErfc.of(order - 1, (2 * n + xi) / s);
                    double far = RepeatedErfc.of(order - 1, (2 * n + 2 - xi) / s);
                    term = -(near + far) / s;
                    envelope = Math.abs(near) / s;
                    break;
                }
                default: {
                    double even = RepeatedErfc.of(order + 1, 2 * n / s);
                    double odd = RepeatedErfc.of(order + 1, (2 * n + 1) / s);
                    double next = RepeatedErfc.of(order + 1, (2 * n + 2) / s);
                    term = s * (even - 2 * odd + next);
                    envelope = s * Math.abs(even);
                }
            }
            sum += scale * term;
            if (Series.converged(scale * envelope, sum)) {
                return sum;
            }
            Series.checkCap(n, what);
        }
    }

    /**
     * Sine series linear + sum c_n E_n phi_n(xi) with phi_n = sin(n pi xi) for the value, n pi cos(n pi xi)
     * for the slope and (1 - (-1)^n)/(n pi) for the mean. Stops only past the peak of the envelope
     * (n^2 pi^2 tau &gt;= 1) so that coefficients growing with n are not cut short.
     */
    private static double fourier(Quantity q, double xi, double tau, double linear, IntToDoubleFunction coefficient,
                                  boolean oddOnly, String what) {
        return fourier(q, xi, tau, linear, coefficient, n -> Math.abs(coefficient.applyAsDouble(n)), oddOnly, what);
    }

    private static double fourier(Quantity q, double xi, double tau, double linear, IntToDoubleFunction coefficient,
                                  IntToDoubleFunction magnitude, boolean oddOnly, String what) {
        double rate = Math.PI * Math.PI * tau;
        double sum = linear;
        for (int n = 1; ; n += oddOnly ? 2 : 1) {
            double exponent = (double) n * n * rate;
            double decay = Math.exp(-exponent);
            double npi = n * Math.PI;
            double basis;
            double bound;
            switch (q) {
                case VALUE:
                    basis = Math.sin(npi * xi);
                    bound = 1;
                    break;
                case SLOPE:
                    basis = npi * Math.cos(npi * xi);
                    bound = npi;
                    break;
                default:
                    basis = n % 2 == 1 ? 2 / npi : 0;
                    bound = 2 / npi;
            }
            if (decay > 0) {
                sum += coefficient.applyAsDouble(n) * decay * basis;
            }
            if (exponent >= 1 && Series.converged(magnitude.applyAsDouble(n) * decay * bound, sum)) {
                return sum;
            }
            Series.checkCap(n, what);
        }
    }
}
