package org.gyreplan.app.report;

import org.gyreplan.app.pipeline.NamedSeries;
import org.gyreplan.app.pipeline.Provenance;
import org.gyreplan.app.pipeline.RunWarning;
import org.gyreplan.app.pipeline.StudyResult;
import org.gyreplan.app.scenario.Headline;
import org.gyreplan.app.scenario.Scenario;

import java.io.IOException;
import java.nio.file.Path;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Builds the run's {@code report.html}: one self-contained file (images as data URIs, no scripts, no network)
 * with the study summary, cautions for work at sea, headline numbers and expected-value checks, maps, charts,
 * tables supplied by later stages, warnings and provenance.
 */
public final class ReportWriter {

    /** Reads a staged output by its relative name, or returns null if absent. */
    @FunctionalInterface
    public interface Files {
        byte[] read(String relative) throws IOException;
    }

    /** Extra HTML sections supplied by pipeline stages (e.g. season table, boundary-current diagnostics). */
    public record Section(String id, String title, String html) {}

    private final List<Section> sections = new ArrayList<>();

    public ReportWriter section(Section s) { sections.add(s); return this; }

    public static final String CAUTION = "Not for navigation. Positions, routes and schedules in this report are for study and"
            + " planning only. Verify every position against official nautical charts and current notices to mariners;"
            + " permits and local regulations apply to moorings, stations and ship operations; the master and licensed"
            + " practice decide on deck operations and routes.";

    public String html(StudyResult r, Files files) throws IOException {
        Scenario s = r.scenario();
        StringBuilder h = new StringBuilder(1 << 16);
        String title = s.study.name == null ? "Gyreplan study" : s.study.name;
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\">\n<title>").append(esc(title))
                .append("</title>\n<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n<style>\n")
                .append(CSS).append("</style></head><body>\n");
        h.append("<header><h1>").append(esc(title)).append("</h1>");
        h.append("<p class=\"meta\">Gyreplan ").append(esc(r.provenance().version())).append(" · run finished ")
                .append(DateTimeFormatter.ISO_LOCAL_DATE_TIME.withZone(ZoneOffset.UTC).format(r.provenance().finished().truncatedTo(java.time.temporal.ChronoUnit.SECONDS)))
                .append(" UTC · run time ").append(String.format(Locale.ROOT, "%.1f s", r.provenance().runTime().toMillis() / 1000.0))
                .append("</p>");
        if (s.study.description != null) h.append("<p>").append(esc(s.study.description)).append("</p>");
        h.append("</header>\n");

        h.append("<section class=\"caution\" id=\"cautions\"><h2>Cautions for work at sea</h2><p>").append(esc(CAUTION))
                .append("</p></section>\n");

        // contents
        h.append("<nav><strong>Contents:</strong> <a href=\"#summary\">Summary</a> · <a href=\"#maps\">Maps</a>");
        for (Section sec : sections) h.append(" · <a href=\"#").append(esc(sec.id())).append("\">").append(esc(sec.title())).append("</a>");
        h.append(" · <a href=\"#warnings\">Warnings</a> · <a href=\"#provenance\">Provenance</a> · <a href=\"#files\">Files</a></nav>\n");

        summary(h, r);
        maps(h, r, files);
        for (Section sec : sections) {
            h.append("<section id=\"").append(esc(sec.id())).append("\"><h2>").append(esc(sec.title())).append("</h2>\n")
                    .append(sec.html()).append("</section>\n");
        }
        warnings(h, r);
        provenance(h, r.provenance());
        filesList(h, r);
        h.append("<footer>").append(esc(CAUTION)).append("</footer>\n</body></html>\n");
        return h.toString();
    }

    private static void summary(StringBuilder h, StudyResult r) {
        h.append("<section id=\"summary\"><h2>Summary</h2>\n<table class=\"num\"><thead><tr><th>Quantity</th><th>Value</th><th>Unit</th>")
                .append("<th>Expected</th><th>Check</th></tr></thead><tbody>\n");
        Map<String, Scenario.Expectation> expected = r.scenario().expectedOrEmpty();
        for (Map.Entry<Headline, Double> e : r.headlines().entrySet()) {
            Headline k = e.getKey();
            Scenario.Expectation x = expected.get(k.key());
            h.append("<tr><td title=\"").append(esc(k.key())).append("\">").append(esc(k.description())).append("</td><td>")
                    .append(esc(number(e.getValue()))).append("</td><td>").append(esc(k.units())).append("</td><td>")
                    .append(x == null ? "" : esc(x.toString())).append("</td><td>");
            if (x != null) h.append(x.accepts(e.getValue()) ? "<span class=\"ok\">pass</span>" : "<span class=\"bad\">FAIL</span>");
            h.append("</td></tr>\n");
        }
        for (Map.Entry<String, Scenario.Expectation> e : expected.entrySet()) {
            if (Headline.byKey(e.getKey()).map(hk -> r.headlines().containsKey(hk)).orElse(false)) continue;
            h.append("<tr><td>").append(esc(e.getKey())).append("</td><td>not computed</td><td></td><td>")
                    .append(esc(e.getValue().toString())).append("</td><td><span class=\"bad\">not checked</span></td></tr>\n");
        }
        h.append("</tbody></table></section>\n");
    }

    private static void maps(StringBuilder h, StudyResult r, Files files) throws IOException {
        h.append("<section id=\"maps\"><h2>Maps and charts</h2>\n");
        int n = 0;
        for (Path p : r.outputFiles()) {
            String rel = p.toString().replace('\\', '/');
            if (!rel.endsWith(".png")) continue;
            byte[] png = files.read(rel);
            if (png == null) continue;
            h.append("<figure><img alt=\"").append(esc(rel)).append("\" src=\"data:image/png;base64,")
                    .append(Base64.getEncoder().encodeToString(png)).append("\"><figcaption>").append(esc(rel))
                    .append("</figcaption></figure>\n");
            n++;
        }
        if (n == 0) h.append("<p>No maps were drawn (maps not requested).</p>");
        h.append("</section>\n");
    }

    private static void warnings(StringBuilder h, StudyResult r) {
        h.append("<section id=\"warnings\"><h2>Warnings</h2>\n");
        if (r.warnings().isEmpty()) h.append("<p>None.</p>");
        else {
            h.append("<ul class=\"warn\">");
            for (RunWarning w : r.warnings()) {
                h.append("<li><strong>").append(esc(w.kind().name().toLowerCase(Locale.ROOT).replace('_', ' ')))
                        .append(":</strong> ").append(esc(w.message())).append("</li>\n");
            }
            h.append("</ul>");
        }
        h.append("</section>\n");
    }

    private static void provenance(StringBuilder h, Provenance p) {
        h.append("<section id=\"provenance\"><h2>Provenance</h2>\n<h3>Parameters</h3><table><tbody>\n");
        for (Map.Entry<String, String> e : p.parameters().entrySet()) {
            h.append("<tr><th>").append(esc(e.getKey())).append("</th><td>").append(esc(e.getValue())).append("</td></tr>\n");
        }
        h.append("<tr><th>Gyreplan version</th><td>").append(esc(p.version())).append("</td></tr>\n");
        h.append("<tr><th>Java</th><td>").append(esc(p.javaVersion())).append("</td></tr>\n");
        h.append("<tr><th>Run started</th><td>").append(esc(p.started().toString())).append("</td></tr>\n");
        h.append("</tbody></table>\n<h3>Input files</h3><table><thead><tr><th>Role</th><th>File</th><th>Bytes</th><th>SHA-256</th></tr></thead><tbody>\n");
        for (Provenance.InputFile f : p.inputs()) {
            h.append("<tr><td>").append(esc(f.role())).append("</td><td>").append(esc(f.path())).append("</td><td>")
                    .append(f.bytes()).append("</td><td><code>").append(esc(f.sha256())).append("</code></td></tr>\n");
        }
        h.append("</tbody></table></section>\n");
    }

    private static void filesList(StringBuilder h, StudyResult r) {
        h.append("<section id=\"files\"><h2>Output files</h2><ul>");
        for (Path p : r.outputFiles()) h.append("<li><code>").append(esc(p.toString())).append("</code></li>");
        h.append("<li><code>report.html</code> (this file)</li></ul></section>\n");
    }

    /** A table of series statistics (used by stages that produce series). */
    public static String seriesTable(List<NamedSeries> series) {
        StringBuilder h = new StringBuilder("<table class=\"num\"><thead><tr><th>Series</th><th>Position</th><th>Days</th><th>Mean</th><th>Unit</th></tr></thead><tbody>");
        for (NamedSeries s : series) {
            double sum = 0; int n = 0;
            for (double v : s.values()) if (Double.isFinite(v)) { sum += v; n++; }
            h.append("<tr><td>").append(esc(s.name())).append("</td><td>")
                    .append(Double.isFinite(s.latDeg()) ? String.format(Locale.ROOT, "%.2f°, %.2f°", s.latDeg(), s.lonDeg()) : "")
                    .append("</td><td>").append(s.values().length).append("</td><td>").append(n == 0 ? "–" : number(sum / n))
                    .append("</td><td>").append(esc(s.units())).append("</td></tr>");
        }
        return h.append("</tbody></table>").toString();
    }

    public static String number(double v) {
        if (!Double.isFinite(v)) return "–";
        double a = Math.abs(v);
        if (v == Math.rint(v) && a < 1e7) return Long.toString((long) v);
        if (a != 0 && (a < 1e-2 || a >= 1e6)) return String.format(Locale.ROOT, "%.3e", v);
        return String.format(Locale.ROOT, "%.4g", v);
    }

    public static String esc(String s) {
        if (s == null) return "";
        StringBuilder b = new StringBuilder(s.length());
        for (char c : s.toCharArray()) {
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }

    private static final String CSS = """
            body { font-family: "DejaVu Sans", Helvetica, Arial, sans-serif; margin: 0 auto; max-width: 1180px; padding: 0 24px 40px; color: #222; }
            header { border-bottom: 3px solid #1f4e79; margin-bottom: 12px; }
            h1 { color: #1b264f; margin: 18px 0 4px; font-size: 26px; }
            h2 { color: #1f4e79; border-bottom: 1px solid #ccd; padding-bottom: 3px; margin-top: 28px; }
            .meta { color: #666; font-size: 13px; margin: 0 0 8px; }
            .caution { background: #fff4e0; border-left: 6px solid #c25b21; padding: 4px 16px 8px; }
            .caution h2 { border: none; color: #7a2e0e; margin-top: 8px; }
            nav { font-size: 14px; margin: 12px 0; }
            table { border-collapse: collapse; margin: 8px 0; font-size: 14px; }
            th, td { border: 1px solid #ccd; padding: 4px 8px; text-align: left; vertical-align: top; }
            thead th { background: #eef2f7; }
            table.num td:nth-child(2) { text-align: right; font-variant-numeric: tabular-nums; }
            .ok { color: #1d6b2c; font-weight: bold; } .bad { color: #b00020; font-weight: bold; }
            figure { margin: 14px 0; } figure img { max-width: 100%; border: 1px solid #ddd; }
            figcaption { font-size: 12px; color: #666; }
            ul.warn li { margin: 4px 0; }
            code { font-size: 12px; word-break: break-all; }
            footer { margin-top: 32px; font-size: 12px; color: #7a2e0e; border-top: 1px solid #ddd; padding-top: 8px; }
            """;
}
