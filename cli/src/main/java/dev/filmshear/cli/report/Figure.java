package dev.filmshear.cli.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;

/**
 * A PNG plot of the result folder, ready to embed: its file name, a caption, and the image as a
 * {@code data:image/png;base64,...} URI (RFC 2397) so the page needs no file beside it.
 *
 * @param fileName the PNG's name in the folder
 * @param caption one sentence saying what the plot shows
 * @param dataUri the image, base64-encoded
 */
record Figure(String fileName, String caption, String dataUri) {

    /** Captions of the plots the writer draws, in the order the page shows them. */
    private static final List<Map.Entry<String, String>> KNOWN = List.of(
            Map.entry("velocity_profiles.png", "Velocity across the film at the output times; where the case "
                    + "has a closed-form solution it is drawn dashed beside the computed profiles."),
            Map.entry("wall_shear_stress.png", "Wall shear stress at the lower and upper walls over time."),
            Map.entry("temperature_profiles.png", "Temperature across the film at the output times."),
            Map.entry("viscosity_profiles.png", "Viscosity across the film at the output times."),
            Map.entry("max_temperature.png", "Highest temperature in the film over time."));

    /** Every PNG file directly in {@code dir}: the known plots in their order, then any other by name. */
    static List<Figure> inFolder(Path dir) throws IOException {
        List<Path> pngs;
        try (Stream<Path> files = Files.list(dir)) {
            pngs = files.filter(Files::isRegularFile)
                    .filter(f -> f.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".png"))
                    .sorted(Comparator.comparing(Figure::rank).thenComparing(f -> f.getFileName().toString()))
                    .toList();
        }
        List<Figure> figures = new ArrayList<>(pngs.size());
        for (Path png : pngs) {
            String name = png.getFileName().toString();
            figures.add(new Figure(name, caption(name),
                    "data:image/png;base64," + Base64.getEncoder().encodeToString(Files.readAllBytes(png))));
        }
        return figures;
    }

    private static int rank(Path file) {
        String name = file.getFileName().toString();
        for (int i = 0; i < KNOWN.size(); i++) {
            if (KNOWN.get(i).getKey().equals(name)) {
                return i;
            }
        }
        return KNOWN.size();
    }

    /** The caption of a known plot, or one made from the file name ("speed_ramp.png": "Speed ramp."). */
    static String caption(String fileName) {
        for (Map.Entry<String, String> known : KNOWN) {
            if (known.getKey().equals(fileName)) {
                return known.getValue();
            }
        }
        String stem = fileName.substring(0, fileName.length() - ".png".length()).replace('_', ' ').strip();
        return stem.isEmpty() ? fileName : Character.toUpperCase(stem.charAt(0)) + stem.substring(1) + ".";
    }
}
