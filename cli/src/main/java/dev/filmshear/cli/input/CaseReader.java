package dev.filmshear.cli.input;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.grid.FilmGrid;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.model.Horizon;
import dev.filmshear.solver.physics.ConstantViscosity;
import dev.filmshear.solver.model.Limits;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Drive;
import dev.filmshear.solver.physics.JournalGeometry;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Function;
import java.util.function.Supplier;

/**
 * Turns a case file (TOML, the contract's "Case file" section) into a validated {@link CaseFile} holding
 * the solver's immutable {@link FilmCase} in SI units. Every problem is an {@link InputException} naming
 * the file, the line, the dotted key, what is wrong, what was given and what is allowed.
 *
 * <p>Rules beyond the contract's table of keys:
 * <ul>
 *   <li>Unknown keys are rejected everywhere, inside inline tables too, with the keys allowed there.</li>
 *   <li>A wall's {@code velocity} is a quantity (constant from t = 0) or an inline table with
 *       {@code kind} = {@code "constant"} ({@code value}), {@code "ramp"} ({@code to}, {@code duration},
 *       optional {@code from}, {@code start}), {@code "sine"} ({@code amplitude}, {@code frequency},
 *       optional {@code mean} = 0, {@code phase} = 0) or {@code "table"} ({@code times}, {@code values}).
 *       A ramp's {@code from} defaults to {@code initial.velocity}, so that a wall ramping up starts with
 *       the fluid next to it instead of jumping at t = 0. A wall without {@code velocity} is at rest.</li>
 *   <li>{@code [journal]} sets the gap (its {@code radial_clearance}) and the upper wall's velocity
 *       (pi * diameter * speed, every velocity of the speed's history scaled); {@code geometry.gap},
 *       {@code semi_infinite = true} or {@code upper_wall.velocity} beside it is an error.</li>
 *   <li>Isothermal rule: when none of {@code fluid.specific_heat}, {@code fluid.thermal_conductivity} and
 *       the walls' {@code temperature}, {@code heat_flux}, {@code heat_transfer} is written in the case,
 *       the energy equation is not solved; when any is, all that the energy equation needs must be there
 *       (specific heat, conductivity, one thermal condition per wall, {@code initial.temperature}). A
 *       preset's thermal properties fill in only for a thermal case.</li>
 *   <li>{@code specific_heat} and {@code thermal_conductivity} are quantities or inline tables
 *       {@code { value, temperature, slope }} for value * (1 + slope * (T - temperature)); the
 *       temperature defaults to {@code initial.temperature}.</li>
 *   <li>{@code density_temperature} defaults to {@code initial.temperature}; {@code viscosity} may also
 *       be a bare quantity, shorthand for {@code law = "constant"}.</li>
 *   <li>Defaults: {@code initial.velocity} 0, {@code pressure.gradient} 0, {@code time.tolerance}
 *       {@value FilmCase#DEFAULT_TOLERANCE}, {@code grid.points} {@value GridSpec#DEFAULT_POINTS},
 *       {@code grid.clustering} 0, no output times, {@code output.plots} false, the title the file's name.</li>
 *   <li>Parameters the solver's records reject ({@link InvalidParameterException}) are reported at the
 *       case key they came from.</li>
 * </ul>
 *
 * <p>Viscosity laws come from a registry {@code Map<String, LawReader>} ({@link ViscosityLaws#standard()})
 * and fluids from {@code Map<String, FluidPreset>} ({@link FluidPreset#standard()}), both passed in.
 * A reader holds no mutable state and may be shared between threads.
 */
public final class CaseReader {

    static final List<String> ROOT_KEYS = List.of("title", "geometry", "journal", "fluid", "lower_wall",
            "upper_wall", "pressure", "initial", "time", "grid", "output", "limits");
    static final String[] GEOMETRY_KEYS = {"gap", "semi_infinite", "depth"};
    static final String[] JOURNAL_KEYS = {"diameter", "length", "radial_clearance", "speed"};
    static final List<String> FLUID_KEYS = List.of("preset", "density", "specific_heat", "thermal_conductivity",
            "thermal_expansion", "density_temperature", "viscosity");
    static final List<String> THERMAL_CONDITIONS = List.of("temperature", "heat_flux", "heat_transfer");
    static final String[] WALL_KEYS = {"velocity", "temperature", "heat_flux", "heat_transfer"};
    static final Map<String, List<String>> MOTION_KEYS = Map.of(
            "constant", List.of("kind", "value"),
            "ramp", List.of("kind", "to", "duration", "from", "start"),
            "sine", List.of("kind", "amplitude", "frequency", "mean", "phase"),
            "table", List.of("kind", "times", "values"),
            "driven", List.of("kind", "mass", "force", "initial", "coast_down_fraction"));
    /** The keys of a driven journal's speed table: rotor inertia and torque instead of mass and force. */
    static final List<String> DRIVEN_JOURNAL_KEYS = List.of("kind", "inertia", "torque", "initial",
            "coast_down_fraction");
    static final Map<String, List<String>> DRIVE_KEYS = Map.of(
            "table", List.of("kind", "times", "values"),
            "curve", List.of("kind", "speeds", "values"));
    private static final String MOTION_KINDS =
            "kind = \"constant\", \"ramp\", \"sine\", \"table\" or \"driven\"";
    /** Fraction of its initial speed whose time a coasting wall reports when the case does not say. */
    static final double DEFAULT_COAST_DOWN_FRACTION = 0.1;
    private static final String STEADY = "steady";

    private final Map<String, LawReader> laws;
    private final Map<String, FluidPreset> presets;

    /** A reader with the standard laws and presets of this version. */
    public CaseReader() {
        this(ViscosityLaws.standard(), FluidPreset.standard());
    }

    /**
     * A reader with the given registries.
     *
     * @param laws law name to reader
     * @param presets preset name to fluid
     */
    public CaseReader(Map<String, LawReader> laws, Map<String, FluidPreset> presets) {
        this.laws = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(laws));
        this.presets = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(presets));
    }

    /** The viscosity laws this reader knows. */
    public Map<String, LawReader> laws() {
        return laws;
    }

    /** The fluid presets this reader knows. */
    public Map<String, FluidPreset> presets() {
        return presets;
    }

    /** Reads a case file (UTF-8); messages name the path as given. */
    public CaseFile read(Path file) {
        return read(TomlDocument.read(file));
    }

    /** Reads a case from text; messages name {@code fileName}. */
    public CaseFile read(String text, String fileName) {
        return read(TomlDocument.parse(text, fileName));
    }

    /** Reads a parsed case, with any overrides it carries. */
    public CaseFile read(TomlDocument document) {
        Objects.requireNonNull(document, "document");
        return new Reading(document).read();
    }

    private static Function<String, String> keys(Map<String, String> parameterToKey, String fallback) {
        return parameter -> parameterToKey.getOrDefault(parameter, fallback);
    }

    private static String defaultTitle(String fileName) {
        String name = fileName.substring(Math.max(fileName.lastIndexOf('/'), fileName.lastIndexOf('\\')) + 1);
        return name.endsWith(".toml") ? name.substring(0, name.length() - ".toml".length()) : name;
    }

    /** The state of reading one document; each part of the file is read by one method. */
    private final class Reading {
        private final TomlDocument doc;
        private final Section root;
        private Section geometry;
        private Section journal;
        private Section userFluid;
        private Section lower;
        private Section upper;
        private Section pressure;
        private Section initial;
        private Section time;
        private Section grid;
        private Section output;
        private Section limits;
        private double viscosityAtStart = Double.NaN;
        private double gapForEstimates = Double.NaN;
        private double initialVelocity;
        private double initialTemperature;

        Reading(TomlDocument doc) {
            this.doc = doc;
            this.root = Section.root(doc);
        }

        CaseFile read() {
            root.allowOnly(ROOT_KEYS);
            geometry = root.table("geometry", GEOMETRY_KEYS);
            journal = root.table("journal", JOURNAL_KEYS);
            userFluid = root.table("fluid", FLUID_KEYS.toArray(String[]::new));
            lower = root.table("lower_wall", WALL_KEYS);
            upper = root.table("upper_wall", WALL_KEYS);
            pressure = root.table("pressure", "gradient");
            initial = root.table("initial", "velocity", "temperature", "steady");
            time = root.table("time", "end", "tolerance");
            grid = root.table("grid", "points", "clustering");
            output = root.table("output", "times", "plots");
            limits = root.table("limits", "max_temperature");

            String title = root.string("title", defaultTitle(doc.fileName()));
            initialVelocity = initial.quantity("velocity", QuantityKind.VELOCITY, 0);
            initialTemperature = initial.quantity("temperature", QuantityKind.ABSOLUTE_TEMPERATURE, Double.NaN);
            JournalSpec journalSpec = journal.present() ? journal() : null;
            final JournalSpec journalForDomain = journalSpec;
            Domain domain = journalSpec != null
                    ? build(() -> new Domain.Gap(journalForDomain.radialClearance()), p -> journal.key("radial_clearance"))
                    : domain();
            boolean finite = domain instanceof Domain.Gap;
            Section fluid = fluidWithPreset();
            DensityLaw density = density(fluid);
            ViscosityLaw viscosity = viscosity(fluid, density);
            viscosityAtStart = viscosity.mu(Double.isNaN(initialTemperature) ? 293.15 : initialTemperature);
            gapForEstimates = domain instanceof Domain.Gap g ? g.gap() : Double.NaN;
            if (journalSpec != null && journalSpec.speed() instanceof WallMotion.Driven) {
                journalSpec = drivenJournal(journalSpec);
            }
            WallMotion lowerMotion = motion(lower, "velocity", QuantityKind.VELOCITY, initialVelocity);
            WallMotion upperMotion = journalSpec != null ? journalSpec.shaftMotion()
                    : finite ? motion(upper, "velocity", QuantityKind.VELOCITY, initialVelocity) : null;

            ThermalCondition lowerThermal = thermal(lower);
            ThermalCondition upperThermal = finite ? thermal(upper) : null;
            List<String> thermalKeys = writtenThermalKeys();
            PropertyLaw specificHeat = null;
            PropertyLaw conductivity = null;
            if (!thermalKeys.isEmpty()) {
                requireEnergyInputs(thermalKeys, fluid, lowerThermal, upperThermal, finite);
                specificHeat = property(fluid, "specific_heat", QuantityKind.SPECIFIC_HEAT);
                conductivity = property(fluid, "thermal_conductivity", QuantityKind.CONDUCTIVITY);
            } else if (Double.isNaN(initialTemperature) && (!viscosity.isConstant() || !density.isConstant())) {
                throw initial.error("temperature", "missing key temperature: the "
                                + (viscosity.isConstant() ? "density" : "viscosity law") + " depends on temperature",
                        "nothing", QuantityKind.ABSOLUTE_TEMPERATURE.expectation());
            }

            double gradient = pressure.quantity("gradient", QuantityKind.PRESSURE_GRADIENT, 0);
            Horizon horizon = horizon();
            double tolerance = time.quantity("tolerance", QuantityKind.DIMENSIONLESS, FilmCase.DEFAULT_TOLERANCE);
            GridSpec gridSpec = gridSpec();
            double[] outputTimes = outputTimes(horizon);
            boolean plots = output.bool("plots", false);

            Fluid fluidRecord = new Fluid(density, viscosity, specificHeat, conductivity);
            Wall lowerWall = new Wall(lowerMotion, lowerThermal);
            Wall upperWall = finite ? new Wall(upperMotion, upperThermal) : null;
            double v0 = initialVelocity;
            double t0 = initialTemperature;
            FilmPhysics physics = build(() -> new FilmPhysics(domain, fluidRecord, lowerWall, upperWall, gradient,
                            v0, t0, null, null),
                    keys(Map.of("gradient", pressure.key("gradient"), "velocity", initial.key("velocity"),
                            "temperature", initial.key("temperature")), "initial"));
            double maxTemperature = limits.quantity("max_temperature", QuantityKind.ABSOLUTE_TEMPERATURE, Double.NaN);
            Limits caseLimits = build(() -> new Limits(maxTemperature), p -> limits.key("max_temperature"));
            JournalSpec finalJournal = journalSpec;
            JournalGeometry geometry = finalJournal == null ? null
                    : new JournalGeometry(finalJournal.diameter(), finalJournal.length());
            boolean steadyStart = initial.bool("steady", false);
            if (steadyStart && initial.has("velocity")) {
                throw initial.error("velocity", "initial.velocity and initial.steady = true exclude each other",
                        initial.written("velocity"), "either a uniform initial velocity or steady = true");
            }
            if (steadyStart && horizon instanceof Horizon.Steady) {
                throw initial.error("steady", "a steady start needs a transient case", initial.written("steady"),
                        "steady = true only with an end time in [time] end");
            }
            FilmCase filmCase = build(() -> new FilmCase(physics, horizon, gridSpec, tolerance, outputTimes,
                            geometry, caseLimits, steadyStart),
                    keys(Map.of("tolerance", time.key("tolerance"), "times", output.key("times"),
                            "end", time.key("end")), "time"));
            return new CaseFile(doc.fileName(), title, filmCase, plots, doc, journalSpec);
        }

        private Horizon horizon() {
            JsonNode end = time.raw("end");
            String allowed = QuantityKind.TIME.expectation() + ", or \"" + STEADY + "\"";
            if (end == null) {
                throw time.missing("end", allowed);
            }
            if (end.isTextual()) {
                if (end.textValue().strip().equalsIgnoreCase(STEADY)) {
                    return new Horizon.Steady();
                }
                try {
                    Units.parse(end.textValue());
                } catch (UnitException e) {
                    throw time.error("end", e.problem(), time.written("end"), allowed);
                }
            }
            double seconds = time.quantity("end", QuantityKind.TIME);
            return build(() -> new Horizon.Until(seconds), p -> time.key("end"));
        }

        private JournalSpec journal() {
            String leaveOut = " when the case has a [journal] table";
            if (geometry.has("gap")) {
                throw geometry.error("gap", "[journal] sets the gap (its radial_clearance)", geometry.written("gap"),
                        "no geometry.gap" + leaveOut);
            }
            if (geometry.bool("semi_infinite", false)) {
                throw geometry.error("semi_infinite", "a journal bearing has a finite gap",
                        geometry.written("semi_infinite"), "no semi_infinite = true" + leaveOut);
            }
            if (geometry.has("depth")) {
                throw geometry.error("depth", "depth is only for a semi-infinite film", geometry.written("depth"),
                        "no geometry.depth" + leaveOut);
            }
            if (upper.has("velocity")) {
                throw upper.error("velocity", "[journal] sets the upper wall's velocity to pi * diameter * speed",
                        upper.written("velocity"), "no upper_wall.velocity" + leaveOut + " (give journal.speed)");
            }
            double diameter = journal.quantity("diameter", QuantityKind.LENGTH);
            double length = journal.quantity("length", QuantityKind.LENGTH);
            double clearance = journal.quantity("radial_clearance", QuantityKind.LENGTH);
            if (!journal.has("speed")) {
                throw journal.missing("speed", QuantityKind.ROTATIONAL_SPEED.expectation());
            }
            // A speed ramp starts, by default, at the initial fluid velocity expressed in rev/s.
            double fromDefault = diameter > 0 ? initialVelocity / (Math.PI * diameter) : 0;
            WallMotion speed = motion(journal, "speed", QuantityKind.ROTATIONAL_SPEED, fromDefault);
            return build(() -> new JournalSpec(diameter, length, clearance, speed), journal::key);
        }

        private Domain domain() {
            if (geometry.bool("semi_infinite", false)) {
                if (geometry.has("gap")) {
                    throw geometry.error("semi_infinite", "semi_infinite = true and gap exclude each other",
                            geometry.written("semi_infinite"), "either gap or semi_infinite = true");
                }
                if (upper.present()) {
                    throw root.error("upper_wall", "a semi-infinite film has no upper wall", "an [upper_wall] table",
                            "no [upper_wall] table when geometry.semi_infinite = true");
                }
                double depth = geometry.quantity("depth", QuantityKind.LENGTH, Double.NaN);
                return build(() -> new Domain.SemiInfinite(depth), p -> geometry.key("depth"));
            }
            if (geometry.has("depth")) {
                throw geometry.error("depth", "depth is only for a semi-infinite film", geometry.written("depth"),
                        "depth together with semi_infinite = true");
            }
            if (!geometry.has("gap")) {
                throw geometry.missing("gap", QuantityKind.LENGTH.expectation()
                        + "; or semi_infinite = true; or a [journal] table");
            }
            double gap = geometry.quantity("gap", QuantityKind.LENGTH);
            return build(() -> new Domain.Gap(gap), p -> geometry.key("gap"));
        }

        /**
         * A wall or shaft motion. {@code kind} gives the dimension of its velocities (m/s for a wall,
         * rev/s for a journal's speed); {@code defaultFrom} is a ramp's start value when not given.
         */
        private WallMotion motion(Section owner, String name, QuantityKind kind, double defaultFrom) {
            JsonNode node = owner.raw(name);
            String key = owner.key(name);
            if (node == null) {
                return new WallMotion.Steady(0);
            }
            if (!node.isObject()) {
                if (!node.isNumber() && !node.isTextual()) {
                    throw owner.wrongType(name, kind.noun() + " or an inline table", kind.expectation()
                            + ", or an inline table such as { kind = \"ramp\", to = ..., duration = \"2 us\" }");
                }
                double value = owner.quantity(name, kind);
                return build(() -> new WallMotion.Steady(value), p -> key);
            }
            Section table = owner.table(name);
            String kindName = table.string("kind", null);
            if (kindName == null) {
                Set<String> all = new LinkedHashSet<>();
                MOTION_KEYS.values().forEach(all::addAll);
                table.allowOnly(all);
                throw table.missing("kind", MOTION_KINDS);
            }
            List<String> allowed = "driven".equals(kindName) && kind == QuantityKind.ROTATIONAL_SPEED
                    ? DRIVEN_JOURNAL_KEYS : MOTION_KEYS.get(kindName);
            if (allowed == null) {
                throw table.error("kind", "unknown kind of motion \"" + kindName + "\"", table.written("kind"),
                        MOTION_KINDS);
            }
            table.allowOnly(allowed);
            Function<String, String> keyOf = p -> table.key(p.equals("velocity") ? "value" : p);
            switch (kindName) {
                case "constant" -> {
                    double value = table.quantity("value", kind);
                    return build(() -> new WallMotion.Steady(value), keyOf);
                }
                case "ramp" -> {
                    double to = table.quantity("to", kind);
                    double duration = table.quantity("duration", QuantityKind.TIME);
                    double from = table.quantity("from", kind, defaultFrom);
                    double start = table.quantity("start", QuantityKind.TIME, 0);
                    return build(() -> new WallMotion.Ramp(from, to, start, duration), keyOf);
                }
                case "sine" -> {
                    double amplitude = table.quantity("amplitude", kind);
                    double frequency = table.quantity("frequency", QuantityKind.FREQUENCY);
                    double mean = table.quantity("mean", kind, 0);
                    double phase = table.quantity("phase", QuantityKind.ANGLE, 0);
                    return build(() -> new WallMotion.Sine(mean, amplitude, frequency, phase), keyOf);
                }
                case "driven" -> {
                    if (kind == QuantityKind.ROTATIONAL_SPEED) {
                        // a driven shaft: read in drivenJournal once the journal's geometry is known
                        return pendingDrivenJournal(table, defaultFrom);
                    }
                    return drivenWall(table, defaultFrom);
                }
                default -> {
                    return tableMotion(table, kind, keyOf);
                }
            }
        }

        /**
         * A plane wall with inertia and a drive: {@code mass} per unit area, {@code force} per unit area
         * (constant, {@code { kind = "table", times, values }} in time or {@code { kind = "curve", speeds,
         * values }} against the wall's speed), {@code initial} velocity, {@code coast_down_fraction}.
         */
        private WallMotion drivenWall(Section table, double defaultInitial) {
            double mass = table.quantity("mass", QuantityKind.AREAL_MASS);
            double initial = table.quantity("initial", QuantityKind.VELOCITY, defaultInitial);
            double fraction = table.quantity("coast_down_fraction", QuantityKind.DIMENSIONLESS,
                    DEFAULT_COAST_DOWN_FRACTION);
            Drive drive = drive(table, "force", QuantityKind.FORCE_PER_AREA, QuantityKind.VELOCITY, 1, 1);
            double estimate = speedEstimate(drive, initial);
            return build(() -> new WallMotion.Driven(mass, drive, initial, estimate, fraction),
                    p -> table.key(switch (p) {
                        case "initial", "coast_down_fraction", "mass" -> p;
                        default -> "force";
                    }));
        }

        /** The section of a driven journal's speed, kept until the journal's geometry is read. */
        private Section pendingJournalSpeed;
        private double pendingJournalInitial;

        private WallMotion pendingDrivenJournal(Section table, double defaultInitial) {
            pendingJournalSpeed = table;
            pendingJournalInitial = defaultInitial;
            table.allowOnly(DRIVEN_JOURNAL_KEYS);
            // a placeholder carrying only the kind; drivenJournal replaces it
            return new WallMotion.Driven(1, new Drive.Constant(0), 0, 0, DEFAULT_COAST_DOWN_FRACTION);
        }

        /**
         * A driven shaft: rotor {@code inertia} I and {@code torque} Q (constant, a time table, or a motor curve
         * against speed in rpm), turned into the film's terms with the shaft radius R and film area A:
         * mass per area I / (R^2 A), force per area Q / (R A), surface speed pi D n.
         */
        private JournalSpec drivenJournal(JournalSpec spec) {
            Section table = pendingJournalSpeed;
            double radius = spec.radius();
            double area = Math.PI * spec.diameter() * spec.length();
            double inertia = table.quantity("inertia", QuantityKind.MOMENT_OF_INERTIA);
            double initialRevs = table.quantity("initial", QuantityKind.ROTATIONAL_SPEED, pendingJournalInitial);
            double fraction = table.quantity("coast_down_fraction", QuantityKind.DIMENSIONLESS,
                    DEFAULT_COAST_DOWN_FRACTION);
            Drive drive = drive(table, "torque", QuantityKind.TORQUE, QuantityKind.ROTATIONAL_SPEED,
                    1 / (radius * area), spec.circumference());
            double initial = initialRevs * spec.circumference();
            double estimate = speedEstimate(drive, initial);
            WallMotion.Driven shaft = build(() -> new WallMotion.Driven(inertia / (radius * radius * area), drive,
                    initial, estimate, fraction), p -> table.key(switch (p) {
                        case "initial", "coast_down_fraction" -> p;
                        case "mass" -> "inertia";
                        default -> "torque";
                    }));
            return build(() -> new JournalSpec(spec.diameter(), spec.length(), spec.radialClearance(), shaft),
                    journal::key);
        }

        /**
         * A drive read from key {@code name}: a constant quantity of {@code kind}, or an inline table of kind
         * "table" (times, values) or "curve" (speeds of {@code speedKind}, values). Values are multiplied by
         * {@code forceFactor} and speeds by {@code speedFactor} into force per area (Pa) and wall speed (m/s).
         */
        private Drive drive(Section owner, String name, QuantityKind kind, QuantityKind speedKind, double forceFactor,
                            double speedFactor) {
            JsonNode node = owner.raw(name);
            if (node == null) {
                throw owner.missing(name, kind.expectation() + ", or { kind = \"table\", times = [...], values = [...] }"
                        + " or { kind = \"curve\", speeds = [...], values = [...] }");
            }
            if (!node.isObject()) {
                double value = owner.quantity(name, kind) * forceFactor;
                return build(() -> new Drive.Constant(value), p -> owner.key(name));
            }
            Section table = owner.table(name);
            String kindName = table.string("kind", null);
            List<String> allowed = kindName == null ? null : DRIVE_KEYS.get(kindName);
            if (allowed == null) {
                throw kindName == null ? table.missing("kind", "kind = \"table\" or \"curve\"")
                        : table.error("kind", "unknown kind of drive \"" + kindName + "\"", table.written("kind"),
                        "kind = \"table\" (against time) or \"curve\" (against speed)");
            }
            table.allowOnly(allowed);
            String axis = kindName.equals("table") ? "times" : "speeds";
            double[] x = table.quantities(axis, kindName.equals("table") ? QuantityKind.TIME : speedKind);
            double[] f = table.quantities("values", kind);
            if (f.length != x.length) {
                throw table.error("values", f.length + " values for " + x.length + " " + axis, table.written("values"),
                        "one value per point");
            }
            for (int i = 0; i < f.length; i++) {
                f[i] *= forceFactor;
                if (kindName.equals("curve")) {
                    x[i] *= speedFactor;
                }
            }
            return build(() -> kindName.equals("table") ? new Drive.TimeTable(x, f) : new Drive.SpeedCurve(x, f),
                    p -> table.key(p.startsWith("values") ? "values" : axis));
        }

        /**
         * An estimate of the speed a driven wall reaches, for error scaling only: the speed at which a
         * Couette film of the initial viscosity balances the largest force, or a motor curve's top speed.
         */
        private double speedEstimate(Drive drive, double initial) {
            double estimate = Math.abs(initial);
            if (drive instanceof Drive.SpeedCurve curve) {
                for (double u : curve.speeds()) {
                    estimate = Math.max(estimate, Math.abs(u));
                }
            } else if (gapForEstimates > 0 && viscosityAtStart > 0) {
                estimate = Math.max(estimate, drive.maxForce() * gapForEstimates / viscosityAtStart);
            }
            return estimate;
        }

        private WallMotion tableMotion(Section table, QuantityKind kind, Function<String, String> keyOf) {
            double[] times = table.quantities("times", QuantityKind.TIME);
            double[] values = table.quantities("values", kind);
            if (times.length < 2) {
                throw table.error("times", "a table needs at least two points", table.written("times"),
                        "two or more times such as [\"0 s\", \"1 ms\"]");
            }
            if (values.length != times.length) {
                throw table.error("values", values.length + (values.length == 1 ? " value" : " values") + " for "
                                + times.length + " times",
                        table.written("values"), "one value per time");
            }
            JsonNode written = table.raw("times");
            String timesKey = table.key("times");
            if (times[0] < 0) {
                throw table.errorAt(timesKey + "[0]", "negative time", TomlDocument.render(written.get(0)),
                        "times of 0 s or later");
            }
            for (int i = 1; i < times.length; i++) {
                if (!(times[i] > times[i - 1])) {
                    throw table.errorAt(timesKey + "[" + i + "]", "times must increase strictly",
                            TomlDocument.render(written.get(i)),
                            "a time after " + TomlDocument.render(written.get(i - 1)));
                }
            }
            return build(() -> new WallMotion.Table(times, values), keyOf);
        }

        private Section fluidWithPreset() {
            String name = userFluid.string("preset", null);
            if (name == null) {
                return userFluid;
            }
            FluidPreset preset = presets.get(name);
            if (preset == null) {
                throw userFluid.error("preset", "unknown fluid preset \"" + name + "\"", userFluid.written("preset"),
                        presets.isEmpty() ? "no built-in fluids in this version: give the fluid's keys instead"
                                : "one of " + quotedList(presets.keySet()));
            }
            ObjectNode merged = preset.fluidTable();
            for (Map.Entry<String, JsonNode> field : userFluid.node().properties()) {
                if (!field.getKey().equals("preset")) {
                    merged.set(field.getKey(), field.getValue().deepCopy());
                }
            }
            Section fluid = new Section(doc, userFluid.path(), merged, true);
            fluid.allowOnly(FLUID_KEYS);
            return fluid;
        }

        private DensityLaw density(Section fluid) {
            double rho = fluid.quantity("density", QuantityKind.DENSITY);
            double expansion = fluid.quantity("thermal_expansion", QuantityKind.EXPANSION, 0);
            boolean ownTemperature = fluid.has("density_temperature");
            if (expansion == 0 && !ownTemperature) {
                return build(() -> DensityLaw.constant(rho), p -> fluid.key("density"));
            }
            double reference = ownTemperature
                    ? fluid.quantity("density_temperature", QuantityKind.ABSOLUTE_TEMPERATURE) : initialTemperature;
            if (Double.isNaN(reference)) {
                throw fluid.error("density_temperature", "missing key density_temperature: thermal_expansion needs "
                                + "the temperature at which the density is given", "nothing",
                        "fluid.density_temperature, or initial.temperature (its default)");
            }
            String referenceKey = ownTemperature ? fluid.key("density_temperature") : initial.key("temperature");
            return build(() -> new DensityLaw(rho, reference, expansion),
                    keys(Map.of("density", fluid.key("density"), "density_temperature", referenceKey,
                            "thermal_expansion", fluid.key("thermal_expansion")), fluid.path()));
        }

        private ViscosityLaw viscosity(Section fluid, DensityLaw density) {
            JsonNode node = fluid.raw("viscosity");
            if (node == null) {
                throw fluid.missing("viscosity", "a [fluid.viscosity] table with law = one of " + quotedList(laws.keySet()));
            }
            if (!node.isObject()) {
                // Shorthand: viscosity = "30 mPa*s" is law = "constant" with that value.
                LawInput input = new LawInput(fluid, density, initialTemperature);
                double mu = input.dynamicViscosity("viscosity", input.conversionTemperature());
                return build(() -> new ConstantViscosity(mu), p -> fluid.key("viscosity"));
            }
            Section table = fluid.table("viscosity");
            String lawName = table.string("law", null);
            if (lawName == null) {
                Set<String> all = new LinkedHashSet<>(List.of("law", "valid_from", "valid_to"));
                laws.values().forEach(reader -> all.addAll(reader.keys()));
                table.allowOnly(all);
                throw table.missing("law", "law = one of " + quotedList(laws.keySet()));
            }
            LawReader reader = laws.get(lawName);
            if (reader == null) {
                if (ViscosityLaws.CONTRACT_LAWS.contains(lawName)) {
                    throw table.error("law", "viscosity law \"" + lawName + "\" is not available in this version",
                            table.written("law"), "laws available: " + quotedList(laws.keySet()));
                }
                throw table.error("law", "unknown viscosity law \"" + lawName + "\""
                                + Section.closest(lawName, ViscosityLaws.CONTRACT_LAWS), table.written("law"),
                        "one of " + quotedList(laws.keySet()));
            }
            List<String> allowed = new ArrayList<>(List.of("law", "valid_from", "valid_to"));
            allowed.addAll(reader.keys());
            table.allowOnly(allowed);
            double from = table.quantity("valid_from", QuantityKind.ABSOLUTE_TEMPERATURE, Double.NaN);
            double to = table.quantity("valid_to", QuantityKind.ABSOLUTE_TEMPERATURE, Double.NaN);
            if (!Double.isNaN(from) && !Double.isNaN(to) && !(to > from)) {
                throw table.error("valid_to", "valid_to must lie above valid_from", table.written("valid_to"),
                        "a temperature above valid_from = " + table.written("valid_from"));
            }
            return reader.read().apply(new LawInput(table, density, initialTemperature));
        }

        private ThermalCondition thermal(Section wall) {
            List<String> given = THERMAL_CONDITIONS.stream().filter(wall::has).toList();
            if (given.size() > 1) {
                throw wall.error(given.get(1), "a wall takes one thermal condition, and " + wall.key(given.get(0))
                        + " is given too", wall.written(given.get(1)), "one of temperature, heat_flux or heat_transfer");
            }
            if (given.isEmpty()) {
                return null;
            }
            switch (given.get(0)) {
                case "temperature" -> {
                    double t = wall.quantity("temperature", QuantityKind.ABSOLUTE_TEMPERATURE);
                    return build(() -> new ThermalCondition.FixedTemperature(t), p -> wall.key("temperature"));
                }
                case "heat_flux" -> {
                    double q = wall.quantity("heat_flux", QuantityKind.HEAT_FLUX);
                    return build(() -> new ThermalCondition.HeatFlux(q), p -> wall.key("heat_flux"));
                }
                default -> {
                    Section exchange = wall.table("heat_transfer", "coefficient", "ambient");
                    double h = exchange.quantity("coefficient", QuantityKind.HEAT_TRANSFER_COEFFICIENT);
                    double ambient = exchange.quantity("ambient", QuantityKind.ABSOLUTE_TEMPERATURE);
                    return build(() -> new ThermalCondition.HeatTransfer(h, ambient), exchange::key);
                }
            }
        }

        /** The thermal keys written in the case itself (not filled in by a preset), as dotted keys. */
        private List<String> writtenThermalKeys() {
            List<String> written = new ArrayList<>();
            for (String name : List.of("specific_heat", "thermal_conductivity")) {
                if (userFluid.has(name)) {
                    written.add(userFluid.key(name));
                }
            }
            for (Section wall : List.of(lower, upper)) {
                for (String name : THERMAL_CONDITIONS) {
                    if (wall.has(name)) {
                        written.add(wall.key(name));
                    }
                }
            }
            return written;
        }

        private void requireEnergyInputs(List<String> thermalKeys, Section fluid, ThermalCondition lowerThermal,
                                         ThermalCondition upperThermal, boolean finite) {
            List<String> missingKeys = new ArrayList<>();
            List<String> missingWords = new ArrayList<>();
            for (String name : List.of("specific_heat", "thermal_conductivity")) {
                if (!fluid.has(name)) {
                    missingKeys.add(fluid.key(name));
                    missingWords.add(fluid.key(name));
                }
            }
            if (lowerThermal == null) {
                missingKeys.add("lower_wall");
                missingWords.add("lower_wall.temperature, heat_flux or heat_transfer");
            }
            if (finite && upperThermal == null) {
                missingKeys.add("upper_wall");
                missingWords.add("upper_wall.temperature, heat_flux or heat_transfer");
            }
            if (Double.isNaN(initialTemperature)) {
                missingKeys.add(initial.key("temperature"));
                missingWords.add(initial.key("temperature"));
            }
            if (missingKeys.isEmpty()) {
                return;
            }
            String key = missingKeys.get(0);
            TomlDocument.Location where = doc.location(key);
            throw new InputException(where.file(), where.line(), key,
                    "missing: the energy equation is solved because " + String.join(", ", thermalKeys)
                            + (thermalKeys.size() == 1 ? " is" : " are") + " given, and it also needs "
                            + String.join("; ", missingWords),
                    "nothing",
                    "all of fluid.specific_heat, fluid.thermal_conductivity, a temperature, heat_flux or heat_transfer on "
                            + (finite ? "each wall" : "the lower wall")
                            + " and initial.temperature; or none of these thermal keys for an isothermal run");
        }

        private PropertyLaw property(Section fluid, String name, QuantityKind kind) {
            JsonNode node = fluid.raw(name);
            String key = fluid.key(name);
            if (!node.isObject()) {
                double value = fluid.quantity(name, kind);
                return build(() -> PropertyLaw.constant(value), p -> key);
            }
            Section table = fluid.table(name, "value", "temperature", "slope");
            double value = table.quantity("value", kind);
            double slope = table.quantity("slope", QuantityKind.EXPANSION, 0);
            double reference = table.quantity("temperature", QuantityKind.ABSOLUTE_TEMPERATURE, initialTemperature);
            String referenceKey = table.has("temperature") ? table.key("temperature") : initial.key("temperature");
            return build(() -> new PropertyLaw(value, reference, slope),
                    keys(Map.of("reference", table.key("value"), "reference_temperature", referenceKey,
                            "slope", table.key("slope")), key));
        }

        private GridSpec gridSpec() {
            String allowed = "a whole number from " + FilmGrid.MIN_POINTS + " to " + GridSpec.MAX_POINTS
                    + " such as " + GridSpec.DEFAULT_POINTS;
            int points = grid.integer("points", GridSpec.DEFAULT_POINTS, allowed);
            double clustering = grid.quantity("clustering", QuantityKind.DIMENSIONLESS, 0);
            return build(() -> new GridSpec(points, clustering), grid::key);
        }

        private double[] outputTimes(Horizon horizon) {
            if (!output.has("times")) {
                return new double[0];
            }
            if (horizon instanceof Horizon.Steady) {
                throw output.error("times", "a steady case has no output times", output.written("times"),
                        "no output.times when time.end = \"steady\"");
            }
            double[] times = output.quantities("times", QuantityKind.TIME);
            double end = ((Horizon.Until) horizon).end();
            JsonNode written = output.raw("times");
            for (int i = 0; i < times.length; i++) {
                String key = output.key("times") + "[" + i + "]";
                String given = TomlDocument.render(written.get(i));
                if (!(times[i] > 0)) {
                    throw output.errorAt(key, "output time at or before 0 s", given, "times after 0 s up to the end time");
                }
                if (i > 0 && !(times[i] > times[i - 1])) {
                    throw output.errorAt(key, "output times must increase strictly", given,
                            "a time after " + TomlDocument.render(written.get(i - 1)));
                }
                if (times[i] > end) {
                    throw output.errorAt(key, "output time after the end time", given,
                            "times up to time.end = " + time.written("end"));
                }
            }
            return times;
        }

        /** Calls a solver record's constructor and reports a rejected parameter at its case key. */
        private <T> T build(Supplier<T> constructor, Function<String, String> keyOf) {
            try {
                return constructor.get();
            } catch (InvalidParameterException e) {
                String key = keyOf.apply(e.parameter());
                // The value as the user wrote it ("-5 um") says more than its SI form (-4.9999999999999996E-6 m).
                String given = doc.written(key).orElse(e.given());
                TomlDocument.Location where = doc.location(key);
                throw new InputException(where.file(), where.line(), key, "value not allowed", given, e.allowed(), e);
            }
        }
    }

    private static String quotedList(Set<String> names) {
        List<String> quoted = new ArrayList<>();
        for (String name : new TreeSet<>(names)) {
            quoted.add("\"" + name + "\"");
        }
        return quoted.isEmpty() ? "none" : String.join(", ", quoted);
    }
}
