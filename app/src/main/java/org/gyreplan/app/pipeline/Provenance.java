package org.gyreplan.app.pipeline;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Map;

/**
 * Where a result came from: input files with their SHA-256 checksums, every parameter used, the program
 * version and the run time.
 *
 * @param inputs     input files in the order they were read
 * @param parameters parameter name → value with unit, as shown in the report (ordered)
 * @param version    Gyreplan version
 * @param javaVersion Java runtime version
 * @param started    run start (UTC)
 * @param finished   run end (UTC)
 */
public record Provenance(List<InputFile> inputs, Map<String, String> parameters, String version,
                         String javaVersion, Instant started, Instant finished) {

    /** One input file. @param path absolute path @param bytes size in bytes @param sha256 hex checksum */
    public record InputFile(String role, String path, long bytes, String sha256) {}

    public Duration runTime() { return Duration.between(started, finished); }
}
