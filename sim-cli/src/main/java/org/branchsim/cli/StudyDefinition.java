package org.branchsim.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import org.branchsim.core.error.BranchsimException;
import org.branchsim.core.error.ErrorKey;
import org.branchsim.core.study.Variant;

/**
 * What makes a study the study it is, and so what every shard of it must share: the scenario (its name and
 * the SHA-256 of the file's bytes), the variants (their number, the parameters varied and their values or
 * how they are drawn) and the options that shape the outputs (metric to rank by or draw, overlay signals).
 * Options that change only how a study runs (threads, output folder) are not part of it.
 */
sealed interface StudyDefinition permits SweepDefinition, ToleranceDefinition {

    /** @return the command that runs the study: "sweep" or "tolerance" */
    String study();

    /** @return the scenario's name */
    String scenario();

    /** @return the SHA-256 of the scenario file's bytes, as 64 lower-case hex digits */
    String scenarioSha256();

    /** @return the number of variants of the whole study */
    int variants();

    /** @return the varied or toleranced parameter paths, in column order */
    List<String> parameters();

    /**
     * @return every variant of the study as its definition makes it, values as text (a shard's rows are
     *         checked against them before a merge)
     */
    List<Variant> allVariants();

    /** @return the definition as the "study" object of a shard folder's manifest */
    ObjectNode toJson();

    /** @return where the unsharded study writes by default: out/NAME-sweep or out/NAME-tolerance */
    default Path defaultOut() {
        return Path.of("out", scenario() + "-" + study());
    }

    /**
     * @param json the "study" object of a manifest
     * @param reader the manifest being read, for messages
     * @return the definition
     */
    static StudyDefinition fromJson(JsonNode json, ShardJson reader) {
        String study = reader.text(json, "study");
        return switch (study) {
            case "sweep" -> SweepDefinition.fromJson(json, reader);
            case "tolerance" -> ToleranceDefinition.fromJson(json, reader);
            default -> throw reader.bad("\"study\"", "\"sweep\" or \"tolerance\"", "\"" + study + "\"");
        };
    }

    /**
     * @param a one definition's JSON
     * @param b another's
     * @return the first field (in a's order, then b's extra fields) whose values differ, as "field: value in
     *         a, value in b"; null when the two are equal
     */
    static String firstDifference(ObjectNode a, ObjectNode b) {
        List<String> names = new ArrayList<>();
        a.fieldNames().forEachRemaining(names::add);
        b.fieldNames().forEachRemaining(n -> {
            if (!names.contains(n)) {
                names.add(n);
            }
        });
        for (String name : names) {
            if (!Objects.equals(a.get(name), b.get(name))) {
                return name + ": " + shorten(a.get(name)) + " against " + shorten(b.get(name));
            }
        }
        return null;
    }

    private static String shorten(JsonNode v) {
        String s = v == null ? "none" : v.toString();
        return s.length() > 120 ? s.substring(0, 117) + "..." : s;
    }

    /**
     * @param file a scenario file
     * @return the SHA-256 of its bytes as 64 lower-case hex digits
     * @throws BranchsimException SCENARIO_UNREADABLE when the file cannot be read
     */
    static String sha256(Path file) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (IOException e) {
            throw new BranchsimException(ErrorKey.SCENARIO_UNREADABLE, file, String.valueOf(e.getMessage()));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
