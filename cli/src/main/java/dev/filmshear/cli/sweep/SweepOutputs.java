package dev.filmshear.cli.sweep;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** The maps and report.html of a finished sweep or merge folder, made from its sorted results.csv. */
final class SweepOutputs {
    private SweepOutputs() {
    }

    /** Writes the maps (only for a folder holding the whole plan) and the report. */
    static List<SweepMaps.Drawn> write(Path dir, SweepPlan plan, SweepManifest manifest) throws IOException {
        SweepData data = SweepData.read(dir.resolve(ResultsFile.NAME), plan);
        List<SweepMaps.Drawn> maps = manifest.shard().isWhole() ? SweepMaps.write(dir, plan, data) : List.of();
        SweepReport.write(dir, plan, manifest, data, maps);
        return maps;
    }
}
