package org.eddycast.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.List;
import org.eddycast.engine.Engine;
import org.eddycast.engine.StudyResult;
import org.eddycast.forecast.Forecast;
import org.eddycast.particles.Cancellation;
import org.eddycast.particles.RunListener;
import org.eddycast.scenario.ScenarioReader;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The scenario's display units (forecast.units) reach the CSV, the forecast table and figures the window and the
 * sheet show, and the text; the JSON stays SI with its units named. Conversions by the SI definitions:
 * 1 min = 60 s, 1 km = 1,000 m, 1 kg/m^3 = 1,000,000 ug/L.
 */
class DisplayUnitsEverywhereTest {

    private static final String SCENARIO = """
            { "version": 1, "name": "units test",
              "flow": { "kind": "direct", "dimensions": 3, "rmsVelocity": 0.04, "integralLength": 0.25,
                        "correlationTime": 5.0 },
              "substance": { "molecularDiffusivity": 4.25e-10 },
              "release": { "mass": 0.002 },
              "forecast": { "units": { "concentration": "ug/L", "time": "min", "distance": "km" } },
              "simulation": { "particles": 512, "groupSize": 32, "modes": 16, "timeStep": 0.5, "duration": 60,
                              "seed": 5 } }
            """;

    private static StudyResult result;

    @BeforeAll
    static void run() {
        result = Engine.run(ScenarioReader.parse(SCENARIO), 2, RunListener.NONE, new Cancellation());
    }

    @Test
    void theCsvNamesAndUsesTheDisplayUnits() {
        List<String> table = CurveCsv.text(result).lines().dropWhile(l -> l.startsWith("#")).toList();
        assertTrue(table.get(0).startsWith("time_min,msd_x_km2,msd_x_stderr_km2,msd_y_km2"), table.get(0));
        String[] first = table.get(1).split(",");
        double t = result.diffusivity().times()[0];
        double msd = result.diffusivity().meanSquareDisplacement(0)[0];
        assertEquals(t / 60, Double.parseDouble(first[0]), 1e-8 * t / 60);
        assertEquals(msd * 1e-6, Double.parseDouble(first[1]), 1e-8 * msd * 1e-6);
    }

    @Test
    void theTablesOfTheWindowAndTheSheetUseThem() {
        SummaryContent content = SummaryContent.of(result);
        SummaryContent.Table table = content.forecastTable();
        assertEquals("time (min)", table.header().get(0));
        assertTrue(table.header().contains("peak concentration (ug/L)"), table.header().toString());
        Forecast f = result.forecast();
        int last = f.grid().length - 1;
        List<String> lastRow = table.rows().get(table.rows().size() - 1);
        assertEquals(SummaryContent.number(f.grid()[last] / 60), lastRow.get(0));
        assertEquals(SummaryContent.number(f.peakConcentration()[last] * 1e6), lastRow.get(lastRow.size() - 2));
        SummaryContent.Row until = content.forecast().get(content.forecast().size() - 1);
        assertEquals("min", until.unit());
        assertEquals(SummaryContent.number(f.simulatedUntil() / 60), until.value());
        String text = TextSummary.of(result);
        assertTrue(text.contains("time min") && text.contains("peak ug/L"), text);
    }

    @Test
    void theSheetShowsThem(@TempDir Path dir) throws Exception {
        Path pdf = dir.resolve("sheet.pdf");
        org.eddycast.sheet.SummarySheetPdf.write(result, pdf);
        try (org.apache.pdfbox.pdmodel.PDDocument d = org.apache.pdfbox.Loader.loadPDF(pdf.toFile())) {
            String text = new org.apache.pdfbox.text.PDFTextStripper().getText(d).replaceAll("\\s+", " ");
            assertTrue(text.contains("(ug/L)"), text);
            assertTrue(text.contains("time (min)"), text);
        }
    }

    @Test
    void theJsonStaysSiWithEveryUnitNamed() throws Exception {
        JsonNode forecast = new ObjectMapper().readTree(ResultJson.text(result)).get("forecast");
        assertEquals("s", forecast.get("unit").get("time").asText());
        assertEquals("s", forecast.get("unit").get("simulatedUntil").asText());
        assertEquals("kg/m^3", forecast.get("peakConcentration").get("unit").asText());
        assertEquals(result.forecast().peakConcentration()[3],
                forecast.get("peakConcentration").get("value").get(3).asDouble(), 0);
        assertEquals(result.forecast().simulatedUntil(), forecast.get("simulatedUntil").asDouble(), 0);
    }

    @Test
    void anImpellerSpeedInRpmIsSixtyTimesItsRevolutionsPerSecond() {
        org.eddycast.scenario.DisplayUnits rpm = new org.eddycast.scenario.DisplayUnits("mg/L", "s", "m", "rpm");
        assertEquals(90.0, rpm.speed(1.5), 1e-12);
        org.eddycast.scenario.Scenario s = ScenarioReader.parse(SCENARIO.replace("\"distance\": \"km\"",
                "\"distance\": \"km\", \"speed\": \"rpm\""));
        assertEquals("rpm", s.forecast().units().speed());
        assertEquals(s.forecast(), ScenarioReader.parse(org.eddycast.scenario.ScenarioWriter.text(s)).forecast());
    }
}
