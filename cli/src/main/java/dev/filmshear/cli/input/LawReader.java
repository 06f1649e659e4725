package dev.filmshear.cli.input;

import dev.filmshear.solver.physics.ViscosityLaw;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;

/**
 * How one viscosity law is read from its {@code [fluid.viscosity]} table: the keys it takes and the
 * function that builds the law from them. A registry {@code Map<String, LawReader>} (law name to reader,
 * see {@link ViscosityLaws#standard()}) is handed to the {@link CaseReader}.
 *
 * <p>Every law table may also hold {@code law}, {@code valid_from} and {@code valid_to}; these are not
 * listed in {@code keys}. The case reader rejects any other key before {@code read} is called, and
 * {@link LawInput} turns the solver's {@link dev.filmshear.solver.base.InvalidParameterException} into
 * an input error at the right key.
 *
 * @param keys the law's own keys, for the unknown-key check and for listings
 * @param read builds the law; reads through {@link LawInput} so that units, lines and messages are uniform
 */
public record LawReader(List<String> keys, Function<LawInput, ViscosityLaw> read) {

    public LawReader {
        keys = List.copyOf(keys);
        Objects.requireNonNull(read, "read");
    }
}
