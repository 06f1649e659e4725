/**
 * The verification suite: code verification of the solver (does it solve its equations with the order it claims?)
 * and solution verification of any case (how large is the discretization error of a given run?), as engineering
 * practice asks for them (ASME V&amp;V 20-2009, <i>Standard for Verification and Validation in Computational Fluid
 * Dynamics and Heat Transfer</i>).
 *
 * <p><b>Code verification.</b> A {@link dev.filmshear.validation.suite.VerificationCase} is a problem with an exact
 * solution, a list of refinement {@link dev.filmshear.validation.suite.Level}s and the
 * {@link dev.filmshear.validation.suite.Check}s it measures, each with a {@link dev.filmshear.validation.suite.Rule}:
 * an observed order inside a band around 2, or, where the scheme reproduces the solution exactly, an error below a
 * round-off floor. {@link dev.filmshear.validation.suite.AnalyticCases} holds every closed form of the analytic
 * package set up against the solver; {@link dev.filmshear.validation.suite.ManufacturedVerification} turns the
 * manufactured solutions of the mms package (K. Salari and P. Knupp, SAND2000-1444, 2000) into cases.
 * {@link dev.filmshear.validation.suite.VerificationSuite} runs a list of cases (quick or full, or any list a test
 * builds) into {@link dev.filmshear.validation.suite.VerificationRun}s, and
 * {@link dev.filmshear.validation.suite.VerificationTable} prints them.
 *
 * <p><b>Solution verification.</b> {@link dev.filmshear.validation.suite.SolutionVerification} plans three grids
 * (and tolerances) for any case and estimates the discretization error of its wall shear stresses and highest
 * temperature by Richardson extrapolation and Roache's Grid Convergence Index (P. J. Roache, 1998; references.md
 * 10.2).
 *
 * <p>The suite found a weakness of the steady solver that has since been mended: with an insulated or
 * heat-transfer wall, Newton's second update exceeds its first (the temperature learns of the velocity field only
 * then), which the solver used to read as divergence, so its continuation crawled and, on fine clustered grids,
 * stalled. Every steady case now runs on all six levels.
 */
package dev.filmshear.validation.suite;
