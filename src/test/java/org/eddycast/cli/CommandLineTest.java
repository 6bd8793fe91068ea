package org.eddycast.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line's contract: outputs, exit status, messages. */
class CommandLineTest {

    record Outcome(int status, String out, String err) {
    }

    static Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Outcome(status, out.toString(), err.toString());
    }

    @Test
    void runWritesTheDocumentedJson(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("s.json");
        Files.writeString(scenario, Files.readString(Path.of("presets/verify-shear-flow.json"))
                .replace("\"particles\": 32768", "\"particles\": 2048"));
        Path json = dir.resolve("out.json");
        Path csv = dir.resolve("out.csv");
        Outcome o = run("run", scenario.toString(), "--json", json.toString(), "--csv", csv.toString(),
                "--threads", "2");
        assertEquals(0, o.status(), o.err());
        assertTrue(o.out().contains("eddy diffusivity"), o.out());
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        for (String axis : new String[] {"x", "y"}) {
            JsonNode a = root.path("eddyDiffusivity").path(axis);
            assertTrue(a.path("low").asDouble() < a.path("value").asDouble());
            assertTrue(a.path("value").asDouble() < a.path("high").asDouble());
        }
        assertTrue(root.path("lagrangianTimeScale").has("x"));
        assertTrue(root.path("dimensionless").has("kubo"));
        assertTrue(root.path("dimensionless").has("peclet"));
        assertTrue(root.path("warnings").isArray());
        assertTrue(Files.readString(csv).startsWith("# eddycast "));
        assertTrue(Files.readString(csv).contains("\ntime_s,msd_x_m2"));
    }

    @Test
    void badInputExitsTwoWithAMessageAndNoStackTrace(@TempDir Path dir) throws Exception {
        Path scenario = dir.resolve("bad.json");
        Files.writeString(scenario, "{ \"version\": 1, \"flow\": { \"kind\": \"direct\", \"rmsVelocity\": 0 },"
                + " \"substance\": { \"molecularDiffusivity\": 1e-9 } }");
        Outcome o = run("run", scenario.toString());
        assertEquals(2, o.status());
        assertTrue(o.err().contains("flow.rmsVelocity must be between 0 (exclusive) and 100 m/s; got 0"), o.err());
        assertTrue(o.err().contains("flow.integralLength is missing"), o.err());
        assertTrue(!o.err().contains("\tat "), "no stack trace: " + o.err());
        Outcome missing = run("run", dir.resolve("nothere.json").toString());
        assertEquals(2, missing.status());
        assertTrue(missing.err().contains("no such file"), missing.err());
        assertEquals(2, run("run").status());
        assertEquals(2, run("run", scenario.toString(), "--threads", "0").status());
    }

    @Test
    void analyzeWritesAFlowThatRunAccepts(@TempDir Path dir) throws Exception {
        Path flow = dir.resolve("scenario.json");
        Outcome o = run("analyze", "presets/records/flume-probe.csv", "--json", flow.toString(), "--scenario");
        assertEquals(0, o.status(), o.err());
        assertTrue(o.out().contains("dissipation rate"), o.out());
        org.eddycast.scenario.Scenario s = org.eddycast.scenario.ScenarioReader.read(flow);
        assertEquals("direct", s.flow().kind());
        Outcome bad = run("analyze", "README.md");
        assertEquals(2, bad.status());
        assertTrue(bad.err().contains("line "), bad.err());
    }

    /** run --pdf and compare --pdf write sheets whose text carries the results, the verdict and the cautions. */
    @Test
    void runAndCompareWriteTheirSheets(@TempDir Path dir) throws Exception {
        String base = Files.readString(Path.of("presets/option-ditch-centre-line.json"))
                .replaceAll("\"particles\": \\d+", "\"particles\": 1024");
        Path a = Files.writeString(dir.resolve("a.json"), base);
        Path b = Files.writeString(dir.resolve("b.json"), Files.readString(Path.of("presets/option-ditch-bank.json"))
                .replaceAll("\"particles\": \\d+", "\"particles\": 1024"));
        Path sheet = dir.resolve("run.pdf");
        Outcome o = run("run", a.toString(), "--pdf", sheet.toString());
        assertEquals(0, o.status(), o.err());
        String runText = pdfText(sheet);
        assertTrue(runText.contains("eddy diffusivity along y"), runText);
        assertTrue(runText.contains("licensed professionals"), "cautions on the sheet");
        Path comparison = dir.resolve("compare.pdf");
        Outcome c = run("compare", a.toString(), b.toString(), "--pdf", comparison.toString());
        assertEquals(0, c.status(), c.err());
        String compareText = pdfText(comparison);
        assertTrue(compareText.contains("centre-line") || compareText.contains("Centre-line")
                || compareText.contains("centre line"), compareText);
        assertTrue(compareText.contains("licensed professionals"), "cautions on the comparison sheet");
        // and on standard output, every one of them, after the verdict
        for (String caution : org.eddycast.forecast.Cautions.ALL) {
            assertTrue(c.out().contains(caution), () -> "compare prints no caution \"" + caution + "\": " + c.out());
        }
    }

    private static String pdfText(Path pdf) throws Exception {
        try (org.apache.pdfbox.pdmodel.PDDocument d = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            return new org.apache.pdfbox.text.PDFTextStripper().getText(d).replaceAll("\\s+", " ");
        }
    }

    /** A lone percent sign in an option description is a format error that picocli reports on stderr. */
    @Test
    void everyHelpPageFormatsWithoutWarnings() {
        java.io.PrintStream saved = System.err;
        java.io.ByteArrayOutputStream captured = new java.io.ByteArrayOutputStream();
        System.setErr(new java.io.PrintStream(captured, true));
        try {
            for (String command : new String[] {"run", "compare", "analyze", "check", "bench", "memory"}) {
                Outcome o = run(command, "--help");
                assertEquals(0, o.status(), command);
                assertTrue(o.out().contains("Usage: eddycast " + command), o.out());
            }
        } finally {
            System.setErr(saved);
        }
        assertEquals("", captured.toString());
    }
}
