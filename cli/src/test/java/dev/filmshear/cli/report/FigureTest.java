package dev.filmshear.cli.report;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Base64;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** Which files of a folder become figures, in what order, with what caption. */
class FigureTest {

    @Test
    void theWritersPlotsComeFirstInTheirOrderThenAnyOtherPngByName(@TempDir Path dir) throws IOException {
        byte[] bytes = {(byte) 0x89, 'P', 'N', 'G', 1, 2, 3};
        for (String name : List.of("zeta_extra.png", "max_temperature.png", "velocity_profiles.png",
                "alpha_extra.PNG")) {
            Files.write(dir.resolve(name), bytes);
        }
        Files.writeString(dir.resolve("summary.json"), "{}");
        Files.createDirectory(dir.resolve("folder.png"));
        List<Figure> figures = Figure.inFolder(dir);
        assertEquals(List.of("velocity_profiles.png", "max_temperature.png", "alpha_extra.PNG", "zeta_extra.png"),
                figures.stream().map(Figure::fileName).toList(), "known plots in page order, then the rest by name");
        assertArrayEquals(bytes, Base64.getDecoder().decode(
                figures.get(0).dataUri().substring("data:image/png;base64,".length())));
        assertEquals("Zeta extra.", figures.get(3).caption());
        assertEquals("Highest temperature in the film over time.", figures.get(1).caption());
    }
}
