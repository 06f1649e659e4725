package dev.filmshear.cli.fit;

import dev.filmshear.cli.input.Dimension;
import dev.filmshear.cli.input.Unit;

import java.util.List;
import java.util.Objects;

/**
 * Measured viscosities as read from a data file: the two columns with their units and the points in SI.
 *
 * @param fileName the file as the user named it, for messages
 * @param headerLine 1-based line of the header
 * @param temperature the temperature column
 * @param viscosity the viscosity column (dynamic or kinematic by its unit)
 * @param points the rows in file order
 */
public record ViscosityData(String fileName, int headerLine, Column temperature, Column viscosity,
                            List<Point> points) {

    public ViscosityData {
        Objects.requireNonNull(fileName, "fileName");
        Objects.requireNonNull(temperature, "temperature");
        Objects.requireNonNull(viscosity, "viscosity");
        points = List.copyOf(points);
    }

    /** True when the viscosity column holds kinematic viscosities (m^2/s, cSt), false for dynamic ones. */
    public boolean kinematic() {
        return viscosity.unit().dimension().equals(Dimension.KINEMATIC_VISCOSITY);
    }

    /**
     * One column of the header.
     *
     * @param key the column's name as written (or "column N" when the header gives only a unit), the key
     *     of every message about the column
     * @param unit the column's unit
     */
    public record Column(String key, Unit unit) {
        public Column {
            Objects.requireNonNull(key, "key");
            Objects.requireNonNull(unit, "unit");
        }

        /** The column as its header writes it, for tables: {@code temperature (degC)}. */
        public String heading() {
            return key + " (" + unit.symbol() + ")";
        }
    }

    /**
     * One measured point.
     *
     * @param line 1-based line in the file
     * @param temperature K
     * @param value viscosity in SI: Pa s when dynamic, m^2/s when kinematic
     * @param writtenTemperature the temperature as written, in the column's unit
     * @param writtenValue the viscosity as written, in the column's unit
     */
    public record Point(int line, double temperature, double value, double writtenTemperature,
                        double writtenValue) {
    }
}
