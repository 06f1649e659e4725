package dev.filmshear.cli.sweep;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.filmshear.cli.input.InputException;
import dev.filmshear.cli.output.Version;
import dev.filmshear.solver.base.InvalidParameterException;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

/**
 * sweep.json, written beside results.csv: which plan the rows belong to, and whether the folder is
 * finished.
 *
 * <pre>
 * {
 *   "format" : "filmshear sweep 1",
 *   "plan_file" : "gap-speed.toml",       the plan's file name
 *   "base" : "startup.toml",              the base case as written in the plan
 *   "plan_sha256" : "9f2c...",            {@link SweepPlan#hash()}: base text, axis keys and values
 *   "cases" : 100,                        combinations in the whole plan
 *   "shard" : "2/3",                      the slice in this folder ("1/1" for all)
 *   "shard_cases" : 33,                   combinations in the slice
 *   "header" : "geometry.gap,...",        the first line of results.csv
 *   "complete" : true,                    every case of the slice has a row, sorted by case index
 *   "ok" : 31, "failed" : 2,              row counts when complete, else those of the last start
 *   "filmshear_version" : "0.1.0",
 *   "plan_text" : "...", "base_text" : "..."   the plan and base case as read, so that merge and the
 *                                               maps need no other file
 * }
 * </pre>
 *
 * @param planFile the plan's file name
 * @param base the base case as written in the plan
 * @param hash the plan's SHA-256
 * @param cases combinations in the plan
 * @param shard the slice of the plan in this folder
 * @param header results.csv's header
 * @param complete true when every case of the slice has its row and the file is sorted
 * @param ok rows with status ok
 * @param failed rows with status failed
 * @param planText the plan file's text
 * @param baseText the base case's text
 */
record SweepManifest(String planFile, String base, String hash, long cases, Shard shard, String header,
                     boolean complete, long ok, long failed, String planText, String baseText) {
    static final String NAME = "sweep.json";
    static final String FORMAT = "filmshear sweep 1";
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    SweepManifest {
        Objects.requireNonNull(hash, "hash");
        Objects.requireNonNull(shard, "shard");
    }

    /** The manifest of a plan's slice before any result is counted. */
    static SweepManifest of(SweepPlan plan, Shard shard) {
        return new SweepManifest(plan.planName(), plan.base(), plan.hash(), plan.caseCount(), shard,
                plan.columns().header(), false, 0, 0, plan.planText(), plan.baseText());
    }

    /** A copy with the completion state and counts. */
    SweepManifest finished(boolean isComplete, long okRows, long failedRows) {
        return new SweepManifest(planFile, base, hash, cases, shard, header, isComplete, okRows, failedRows,
                planText, baseText);
    }

    /** A copy for a folder holding the whole plan (a merge). */
    SweepManifest whole() {
        return new SweepManifest(planFile, base, hash, cases, Shard.WHOLE, header, complete, ok, failed, planText,
                baseText);
    }

    /** The plan rebuilt from the stored texts. */
    SweepPlan plan() {
        return SweepPlan.parse(planText, planFile, baseText);
    }

    /** Reads {@code dir/sweep.json} when there is one. */
    static Optional<SweepManifest> read(Path dir) {
        Path file = dir.resolve(NAME);
        if (!Files.exists(file)) {
            return Optional.empty();
        }
        JsonNode root;
        try {
            root = JSON.readTree(Files.readString(file, StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw broken(file, "cannot be read: " + e.getMessage());
        }
        if (!FORMAT.equals(root.path("format").asText())) {
            throw broken(file, "not a sweep manifest of this format");
        }
        for (String key : new String[] {"plan_file", "base", "plan_sha256", "cases", "shard", "header", "complete",
                "plan_text", "base_text"}) {
            if (!root.hasNonNull(key)) {
                throw broken(file, "the key " + key + " is missing");
            }
        }
        Shard shard;
        try {
            shard = Shard.parse(root.get("shard").asText());
        } catch (InvalidParameterException e) {
            throw broken(file, "shard " + root.get("shard").asText() + " is not K/N");
        }
        return Optional.of(new SweepManifest(root.get("plan_file").asText(), root.get("base").asText(),
                root.get("plan_sha256").asText(), root.get("cases").asLong(), shard, root.get("header").asText(),
                root.get("complete").asBoolean(), root.path("ok").asLong(), root.path("failed").asLong(),
                root.get("plan_text").asText(), root.get("base_text").asText()));
    }

    private static InputException broken(Path file, String problem) {
        return new InputException(file.toString(), 0, "(file)", problem, InputException.quote(file.toString()),
                "the sweep.json that filmshear sweep writes beside results.csv");
    }

    /** Writes {@code dir/sweep.json} through a temporary file and an atomic move. */
    void write(Path dir) throws IOException {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT);
        root.put("plan_file", planFile);
        root.put("base", base);
        root.put("plan_sha256", hash);
        root.put("cases", cases);
        root.put("shard", shard.toString());
        root.put("shard_cases", shard.size(cases));
        root.put("header", header);
        root.put("complete", complete);
        root.put("ok", ok);
        root.put("failed", failed);
        root.put("filmshear_version", Version.get());
        root.put("plan_text", planText);
        root.put("base_text", baseText);
        Path file = dir.resolve(NAME);
        Path tmp = ResultsFile.temporary(file);
        try {
            Files.writeString(tmp, JSON.writeValueAsString(root) + "\n", StandardCharsets.UTF_8);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of strings and numbers always serializes", e);
        }
        ResultsFile.replace(tmp, file);
    }
}
