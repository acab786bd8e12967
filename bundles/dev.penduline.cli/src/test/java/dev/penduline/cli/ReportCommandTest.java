package dev.penduline.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.NodeList;

import dev.penduline.services.Cautions;
import dev.penduline.services.FitWording;
import dev.penduline.services.present.Figures;

/**
 * The report end to end through the command line: a small project (a rod-and-bob arm whose parts
 * carry tolerances, two releases made by {@code demo-record}) is fitted, and its report is read
 * back with a real HTML parser (jsoup) and every figure checked against the JSON that
 * {@code inertia}, {@code fit} and {@code predict} print for the same file, after the same
 * rounding; each plot is parsed as XML by the JDK's parser.
 */
class ReportCommandTest {

    private static final String[] PREDICT = {"--theta0-deg", "30", "--at-deg", "0", "--radius-m", "0.6", "--draws", "20"};

    @TempDir
    static Path dir;

    private static Path mechanism;
    private static Object inertiaJson;
    private static Object fitJson;
    private static Object predictJson;
    private static String html;
    private static Document page;

    private static String run(int expected, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        ExitCode code = new PendulineCommandLine().run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(expected, code.code(), String.join(" ", args) + "\n" + out + "\n" + err);
        return out.toString();
    }

    private static String[] with(String[] head, String... tail) {
        return Stream.concat(Stream.of(head), Stream.of(tail)).toArray(String[]::new);
    }

    @BeforeAll
    static void project() throws Exception {
        Path parts = Files.writeString(dir.resolve("arm.csv"), """
                name,shape,mass_kg,x_m,y_m,z_m,length_m,radius_m,axis,mass_tol_kg
                arm,rod,1,0,-0.3,0,0.6,,y,0.02
                bob,sphere,1.5,0,-0.6,0,,0.05,,0.01
                """);
        mechanism = dir.resolve("arm.penduline");
        run(0, "import-parts", parts.toString(), "--to", mechanism.toString());
        for (String angle : new String[] {"12", "40"}) {
            Path record = dir.resolve("release-" + angle + ".csv");
            run(0, "demo-record", mechanism.toString(), "--theta0-deg", angle, "--viscous", "0.01", "--coulomb", "0.04",
                    "--duration", "15", "--rate", "200", "--counts-per-rev", "0", "--noise-deg", "0.02", "--offset-deg",
                    "-1.2", "--seed", angle, "--out", record.toString());
            run(0, "add-session", mechanism.toString(), record.toString());
        }
        fitJson = JsonTree.parse(run(0, "fit", mechanism.toString(), "--resamples", "8", "--json"));
        inertiaJson = JsonTree.parse(run(0, "inertia", mechanism.toString(), "--json"));
        predictJson = JsonTree.parse(run(0, with(new String[] {"predict", mechanism.toString()}, with(PREDICT, "--json"))));
        run(0, with(new String[] {"report", mechanism.toString(), "--predict"}, PREDICT));
        Path report = dir.resolve("arm-report.html");
        assertTrue(Files.isRegularFile(report), "the report goes beside the mechanism file by default");
        html = Files.readString(report);
        page = Jsoup.parse(html);
    }

    @Test
    void everySectionIsThereAndTheCautionIsProminent() {
        for (String id : List.of("summary", "mechanism", "sessions", "fit", "predictions", "provenance", "caution")) {
            assertNotNull(page.getElementById(id), "section " + id);
        }
        List<Element> cautions = page.select("div.caution");
        assertTrue(cautions.size() >= 2, "the caution opens and closes the report");
        assertTrue(page.body().child(1).hasClass("caution") || page.body().child(1).selectFirst("div.caution") != null
                || page.select("body > section").first().previousElementSibling().hasClass("caution"),
                "the first caution comes before the first section");
        for (Element c : cautions) {
            assertTrue(c.text().contains(Cautions.TEXT), c.text());
            assertTrue(c.text().contains("licensed engineering practice"), c.text());
        }
        assertTrue(cautions.get(0).text().contains(Cautions.HAZARD), "the report has predictions: the hazard note too");
    }

    @Test
    void theVerdictComesFirstInTheFitSectionAndMatchesTheFit() {
        Element fit = page.getElementById("fit");
        Element lead = fit.selectFirst("p.lead");
        assertNotNull(lead);
        assertEquals(lead, fit.select("p").first(), "the verdict is the fit section's first statement");
        String dominant = (String) JsonTree.at(fitJson, "dominant");
        assertTrue(lead.text().startsWith("Verdict: "), lead.text());
        if ("mixed".equals(dominant)) {
            assertTrue(lead.text().startsWith("Verdict: mixed"), lead.text());
        } else {
            assertTrue(lead.text().contains("dominates"), lead.text());
        }
        for (String term : List.of("viscous", "coulomb", "drag")) {
            double share = JsonTree.number(fitJson, "energy_share", term);
            double sigma = JsonTree.number(fitJson, "energy_share_sigma", term);
            if (share > 0.005) {
                assertTrue(fit.text().contains(FitWording.percent(share, sigma)), term + " share in " + fit.text());
            }
        }
    }

    /** Every keyed figure in the report equals the figure of the JSON, rounded by the rule the cell names. */
    @Test
    void everyKeyedFigureEqualsTheJsonOfTheCommandsAfterTheSameRounding() {
        List<Element> figures = page.select("[data-key]");
        List<String> wrong = new ArrayList<>();
        int inertia = 0;
        int fit = 0;
        int predict = 0;
        for (Element e : figures) {
            String key = e.attr("data-key");
            String expected = expected(key, e.attr("data-format"), e.attr("data-sigma"));
            if (!expected.equals(e.text())) {
                wrong.add(key + ": report " + e.text() + ", JSON " + expected);
            }
            inertia += key.startsWith("inertia.") ? 1 : 0;
            fit += key.startsWith("fit.") ? 1 : 0;
            predict += key.startsWith("predict.") ? 1 : 0;
        }
        assertEquals(List.of(), wrong);
        // the parts (2 × 4), the totals (8) and the tolerance table (4 × 5); the fit's estimates, shares,
        // sessions, correlations and comparison; the predicted figures
        assertTrue(inertia >= 36, "inertia figures: " + inertia);
        assertTrue(fit >= 30, "fit figures: " + fit);
        assertTrue(predict >= 12, "predict figures: " + predict);
    }

    private static String expected(String key, String format, String sigmaKey) {
        double v = value(key);
        double sigma = sigmaKey.isEmpty() ? Double.NaN : value(sigmaKey);
        return switch (format) {
            case "significant" -> Figures.significant(v);
            case "significant2" -> Figures.significant(v, 2);
            case "measured" -> Figures.measured(v, Double.isFinite(sigma) ? sigma : Double.NaN);
            case "percent" -> Figures.percent(v);
            case "percent2" -> Figures.percent(v, 2);
            case "share" -> FitWording.percent(v, sigma);
            case "whole" -> String.valueOf(Math.round(v));
            case "fixed1" -> Figures.fixed(v, 1);
            case "fixed2" -> Figures.fixed(v, 2);
            case "signed_fixed2" -> (v >= 0 ? "+" : "") + Figures.fixed(v, 2);
            default -> "unknown format " + format;
        };
    }

    /** The number at a key such as {@code fit.terms.viscous.value} or {@code inertia.parts[1].share}. */
    private static double value(String key) {
        String[] head = key.split("\\.", 2);
        Object root = switch (head[0]) {
            case "inertia" -> inertiaJson;
            case "fit" -> fitJson;
            case "predict" -> predictJson;
            default -> null;
        };
        List<Object> steps = new ArrayList<>();
        Matcher m = Pattern.compile("([a-zA-Z_0-9]+)|\\[(\\d+)]").matcher(head[1]);
        while (m.find()) {
            steps.add(m.group(1) != null ? m.group(1) : Integer.valueOf(m.group(2)));
        }
        return JsonTree.number(root, steps.toArray());
    }

    @Test
    void everyPlotIsWellFormedSvgWithItsSeriesAndAxisLabelsWithUnits() throws Exception {
        Matcher svg = Pattern.compile("<svg[\\s\\S]*?</svg>").matcher(html);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        int count = 0;
        List<String> ids = new ArrayList<>();
        while (svg.find()) {
            org.w3c.dom.Document d = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.group().getBytes(
                    StandardCharsets.UTF_8)));
            count++;
            StringBuilder text = new StringBuilder();
            NodeList texts = d.getElementsByTagNameNS("*", "text");
            for (int i = 0; i < texts.getLength(); i++) {
                text.append(texts.item(i).getTextContent()).append('\n');
            }
            // every axis label names its unit in parentheses: "time (s)", "angle (°)", "share of J0 (%)"
            Matcher unit = Pattern.compile("\\((s|°|%|rad/s|m|J|kg·m²)\\)").matcher(text);
            assertTrue(unit.find(), "an axis label with its unit in picture " + count + ": " + text);
            NodeList all = d.getElementsByTagNameNS("*", "*");
            for (int i = 0; i < all.getLength(); i++) {
                org.w3c.dom.Element e = (org.w3c.dom.Element) all.item(i);
                if (e.hasAttribute("id")) {
                    ids.add(e.getAttribute("id"));
                }
            }
        }
        List<Element> figures = page.select("figure");
        assertEquals(figures.size(), count, "one SVG per figure");
        // one part-share chart, three plots per session (record, decay, period), energy shares, the prediction
        assertTrue(count >= 1 + 3 * 2 + 1 + 1, "plots: " + count);
        assertEquals(ids.size(), ids.stream().distinct().count(), "ids are unique across the inline pictures");
        // the series each kind of plot draws, counted from the SVG's own series groups
        java.util.Map<String, Integer> series = java.util.Map.of("parts", 1, "record", 3, "decay", 4, "period", 2,
                "energy", 1, "prediction", 1);
        // the axis labels of each kind of plot, each with its unit
        java.util.Map<String, List<String>> axes = java.util.Map.of("parts", List.of("share of J0 (%)"),
                "record", List.of("time (s)", "angle (°)", "residual (°)"),
                "decay", List.of("cycles since release (cycles)", "amplitude (°)"),
                "period", List.of("amplitude (°)", "period (s)"),
                "energy", List.of("share of the energy dissipated (%)"),
                "prediction", List.of("time (s)", "angle from the hanging position (°)"));
        for (Element fig : figures) {
            String kind = fig.id().replaceFirst("^fig\\d+-", "").replaceFirst("-.*", "");
            assertTrue(series.containsKey(kind), fig.id());
            long drawn = fig.select("g.series").stream().map(g -> g.attr("data-series")).distinct().count();
            assertEquals(series.get(kind).longValue(), drawn, fig.id() + " series");
            List<String> labels = fig.select("text").stream().map(Element::text).toList();
            for (String axis : axes.get(kind)) {
                assertTrue(labels.contains(axis), fig.id() + " has no axis label '" + axis + "': " + labels);
            }
        }
    }

    @Test
    void nothingOutsideTheFileIsReferenced() {
        assertTrue(page.select("script, link, iframe, object, embed, img[src], image").isEmpty(), "no scripts or outside files");
        for (Element e : page.getAllElements()) {
            for (org.jsoup.nodes.Attribute a : e.attributes()) {
                String name = a.getKey().toLowerCase(Locale.ROOT);
                if (name.equals("href") || name.endsWith(":href") || name.equals("src")) {
                    assertTrue(a.getValue().startsWith("#"), e.tagName() + " " + name + "=" + a.getValue());
                }
            }
        }
        String lower = html.toLowerCase(Locale.ROOT);
        assertFalse(lower.contains("@import") || lower.contains("url(http") || lower.contains("url(//"), "no outside styles");
        assertFalse(Pattern.compile("https?://(?!www\\.w3\\.org/)").matcher(html).find(), "no address outside the file");
    }

    @Test
    void theProvenanceNamesTheVersionTheSettingsAndTheHashesOfTheFileAndEveryRecord() throws Exception {
        String text = page.getElementById("provenance").text();
        assertTrue(text.contains("Penduline "), text);
        assertTrue(text.contains(sha256(mechanism)), "the mechanism file's SHA-256: " + text);
        for (String angle : new String[] {"12", "40"}) {
            Path record = dir.resolve("records").resolve("release-" + angle + ".csv");
            record = Files.exists(record) ? record : dir.resolve("release-" + angle + ".csv");
            assertTrue(text.contains(sha256(record)), "record " + angle + ": " + text);
        }
        assertTrue(text.contains("resamples"), "the settings: " + text);
        assertTrue(text.contains((String) JsonTree.at(fitJson, "stored_as")), "the stored fit's id");
    }

    /** SHA-256 by the JDK's MessageDigest, independent of Penduline's own hashing. */
    private static String sha256(Path file) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
    }

    @Test
    void markdownGoesWithItsPlotsAsSvgFilesBeside() throws Exception {
        Path md = dir.resolve("notes").resolve("arm.md");
        Files.createDirectories(md.getParent());
        run(0, "report", mechanism.toString(), "--format", "md", "--out", md.toString());
        String text = Files.readString(md);
        Path figures = md.resolveSibling("arm-figures");
        List<Path> svgs;
        try (Stream<Path> s = Files.list(figures)) {
            svgs = s.filter(p -> p.toString().endsWith(".svg")).sorted().toList();
        }
        Matcher link = Pattern.compile("!\\[[^]]*]\\((arm-figures/[^)]+\\.svg)\\)").matcher(text);
        int links = 0;
        while (link.find()) {
            links++;
            assertTrue(Files.isRegularFile(md.resolveSibling(link.group(1))), link.group(1));
        }
        assertEquals(svgs.size(), links, "every picture is linked");
        assertTrue(links >= 8, "plots: " + links);
        for (Element e : page.select("[data-key]")) {
            if (!e.attr("data-key").startsWith("predict.")) {
                assertTrue(text.contains(e.text().replace("*", "\\*")), "the Markdown has " + e.attr("data-key") + " = "
                        + e.text());
            }
        }
        assertTrue(text.contains(Cautions.TEXT.replace("*", "\\*")), "the caution");
    }

    @Test
    void aReportIsNeverWrittenOverARecordOrAForeignFileAndAnEarlierReportIsReplaced() throws Exception {
        Path record = dir.resolve("records").resolve("release-12.csv");
        if (!Files.exists(record)) {
            record = dir.resolve("release-12.csv");
        }
        byte[] before = Files.readAllBytes(record);
        run(2, "report", mechanism.toString(), "--out", record.toString(), "--force");
        assertEquals(HexFormat.of().formatHex(before), HexFormat.of().formatHex(Files.readAllBytes(record)));
        Path foreign = Files.writeString(dir.resolve("notes.html"), "<p>my notes</p>");
        run(2, "report", mechanism.toString(), "--out", foreign.toString());
        assertEquals("<p>my notes</p>", Files.readString(foreign));
        Path again = dir.resolve("again.html");
        run(0, "report", mechanism.toString(), "--out", again.toString());
        run(0, "report", mechanism.toString(), "--out", again.toString());
        assertTrue(Files.readString(again).contains("<meta name=\"generator\" content=\"Penduline "));
    }

    @Test
    void aMissingRecordIsSaidWhereItsSessionIsAndTheRestIsReported() throws Exception {
        Path copy = Files.createDirectories(dir.resolve("copy"));
        Files.copy(mechanism, copy.resolve("arm.penduline"));
        for (String angle : new String[] {"12", "40"}) {
            Path record = dir.resolve("records").resolve("release-" + angle + ".csv");
            Path from = Files.exists(record) ? record : dir.resolve("release-" + angle + ".csv");
            Path to = copy.resolve(dir.relativize(from).toString());
            Files.createDirectories(to.getParent());
            Files.copy(from, to);
            if ("40".equals(angle)) {
                Files.delete(to);
            }
        }
        run(0, "report", copy.resolve("arm.penduline").toString());
        Document d = Jsoup.parse(Files.readString(copy.resolve("arm-report.html")));
        assertTrue(d.getElementById("sessions").text().contains("The record cannot be read"), d.getElementById("sessions")
                .text());
        assertTrue(d.getElementById("provenance").text().contains("CANNOT BE READ"), "the provenance says so");
        assertNotNull(d.getElementById("fit"), "the fit is still reported");
        assertEquals(3 + 1 + 1, d.select("figure").size(), "one session's three plots, the parts, the energy shares "
                + "and no prediction: " + d.select("figure").eachAttr("id"));
    }
}
