package dev.penduline.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * The pictures are read back with the JDK's own XML parser (namespace-aware DOM), the outside
 * check here: each is one standalone SVG element, shows as many series as it says, names its
 * axes with units in {@code <text>}, keeps its ids apart from another picture's, refers to
 * nothing outside itself and uses black, white and greys only.
 */
class PlotsTest {

    private static final String SVG = "http://www.w3.org/2000/svg";
    private static final Pattern RGB = Pattern.compile("rgb\\((\\d+),(\\d+),(\\d+)\\)");
    private static final Pattern URL_REF = Pattern.compile("url\\(#([^)]+)\\)");
    private static final Pattern LONG_DECIMAL = Pattern.compile("\\d\\.\\d{3,}");

    /** A 30 s swing at {@code rate} Hz: angle, model, residual; released at 2 s, stopped at 27 s. */
    private static double[][] swing(int n) {
        double[] t = new double[n];
        double[] measured = new double[n];
        double[] model = new double[n];
        double[] residual = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = 30.0 * i / (n - 1);
            double s = Math.max(0, t[i] - 2);
            double m = t[i] < 2 ? 25 : t[i] > 27 ? 0.4 : 25 * Math.exp(-0.15 * s) * Math.cos(2 * Math.PI * s / 1.1);
            model[i] = t[i] < 2 ? Double.NaN : m;
            measured[i] = m + 0.3 * Math.sin(97.0 * i);
            residual[i] = measured[i] - model[i];
        }
        return new double[][] {t, measured, model, residual};
    }

    private static SvgPicture record(String id, int n) {
        double[][] s = swing(n);
        return Plots.sessionRecord(id, "Session 1: record and model", s[0], s[1], s[2], s[3], 2.0, 27.0);
    }

    private static Curve line(String name, double a, double decay) {
        int n = 500;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = 0.05 * i;
            y[i] = a * Math.exp(-decay * x[i]);
        }
        return new Curve(name, x, y);
    }

    /** The large-amplitude period 2π/ω0 · 2K(sin(θ0/2))/π, K by the arithmetic-geometric mean (test data only). */
    private static Curve periodCurve() {
        int n = 90;
        double[] a = new double[n];
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = i + 1;
            double k = Math.sin(Math.toRadians(a[i]) / 2);
            double x = 1;
            double y = Math.sqrt(1 - k * k);
            for (int j = 0; j < 30; j++) {
                double m = (x + y) / 2;
                y = Math.sqrt(x * y);
                x = m;
            }
            p[i] = 1.2 / x;
        }
        return new Curve("large-amplitude period", a, p);
    }

    /** One picture of each kind with its expected series count and labels. */
    private static Map<SvgPicture, Integer> everyKind(String prefix) {
        Map<SvgPicture, Integer> all = new LinkedHashMap<>();
        all.put(Plots.partShares(prefix + "shares", "Shares of J0", List.of("rod", "disc", "hole", "rod"),
                new double[] {48.5, 60.2, -12.0, 3.3}), 1);
        all.put(record(prefix + "record", 6_000), 3);
        double[] cycles = {0, 1, 2, 3, 4, 5, 6, 7, 8};
        double[] peaks = new double[cycles.length];
        for (int i = 0; i < peaks.length; i++) {
            peaks[i] = 25 * Math.exp(-0.2 * cycles[i]);
        }
        all.put(Plots.amplitudeDecay(prefix + "decay", "Amplitude decay", "cycle (1)", cycles, peaks,
                List.of(line("viscous", 25, 0.2), line("Coulomb", 25, 0.15), line("both", 24, 0.18))), 4);
        all.put(Plots.periodAmplitude(prefix + "period", "Period and amplitude", new double[] {5, 10, 20, 30},
                new double[] {1.202, 1.206, 1.222, 1.25}, periodCurve()), 2);
        all.put(Plots.energyShares(prefix + "energy", "Where the energy went", List.of("viscous", "Coulomb", "air"),
                new double[] {62, 30, 8}, new double[] {4, 3, Double.NaN}), 1);
        all.put(Plots.timeSeries(prefix + "prediction", "Predicted swing", "angle (°)",
                List.of(line("predicted", 30, 0.1))), 1);
        all.put(Plots.controlChart(prefix + "control", "Individuals chart", "viscous b (N·m·s/rad)",
                new double[] {0.010, 0.011, 0.0105, 0.0098, 0.030, 0.0102}, 0.0136, 0.0051, 0.0221), 3);
        all.put(Plots.histogram(prefix + "histogram", "Histogram", "viscous b (N·m·s/rad)",
                new double[] {0.010, 0.011, 0.0105, 0.0098, 0.030, 0.0102}), 1);
        return all;
    }

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> elements(Document d, String name) {
        return elements(d.getDocumentElement(), name);
    }

    private static List<Element> elements(Element parent, String name) {
        NodeList nodes = parent.getElementsByTagNameNS(SVG, name);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            out.add((Element) nodes.item(i));
        }
        return out;
    }

    /** The names of the series groups that draw something. */
    private static Set<String> series(Document d) {
        Set<String> names = new TreeSet<>();
        for (Element g : elements(d, "g")) {
            if ("series".equals(g.getAttribute("class")) && g.getElementsByTagNameNS(SVG, "*").getLength() > 0) {
                names.add(g.getAttribute("data-series"));
            }
        }
        return names;
    }

    private static Set<String> texts(Document d) {
        Set<String> out = new HashSet<>();
        for (Element t : elements(d, "text")) {
            out.add(t.getTextContent().trim());
        }
        return out;
    }

    private static List<String> ids(Document d) {
        List<String> out = new ArrayList<>();
        NodeList all = d.getElementsByTagNameNS("*", "*");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.hasAttribute("id")) {
                out.add(e.getAttribute("id"));
            }
        }
        return out;
    }

    @Test
    void everyPictureIsOneStandaloneSvgElementWithItsSize() throws Exception {
        for (SvgPicture p : everyKind("p-").keySet()) {
            Document d = parse(p.svg());
            Element root = d.getDocumentElement();
            assertEquals(SVG, root.getNamespaceURI(), p.id());
            assertEquals("svg", root.getLocalName(), p.id());
            assertEquals(p.id(), root.getAttribute("id"));
            assertEquals(p.width(), Double.parseDouble(root.getAttribute("width")), 1e-9, p.id());
            assertEquals(p.height(), Double.parseDouble(root.getAttribute("height")), 1e-9, p.id());
            String[] box = root.getAttribute("viewBox").trim().split("[ ,]+");
            assertEquals(4, box.length, p.id() + " viewBox");
            assertEquals(p.width(), Double.parseDouble(box[2]), 1e-9, p.id());
            assertEquals(p.height(), Double.parseDouble(box[3]), 1e-9, p.id());
            assertTrue(p.width() >= 700 && p.width() <= 740, p.id() + " width " + p.width());
            assertTrue(p.height() >= 280 && p.height() <= 440, p.id() + " height " + p.height());
            assertFalse(p.svg().startsWith("<?xml"), "no XML declaration, it is inlined");
        }
    }

    @Test
    void theSeriesCountIsWhatTheSvgShows() throws Exception {
        for (Map.Entry<SvgPicture, Integer> e : everyKind("c-").entrySet()) {
            SvgPicture p = e.getKey();
            assertEquals(e.getValue(), p.seriesCount(), p.id());
            assertEquals(e.getValue(), series(parse(p.svg())).size(), p.id() + " shows " + series(parse(p.svg())));
        }
        Set<String> names = series(parse(record("r", 3_000).svg()));
        assertEquals(Set.of("measured", "model", "residual"), names);
    }

    @Test
    void everyAxisLabelCarriesItsUnitAndIsDrawnAsText() throws Exception {
        Pattern unit = Pattern.compile(".+ \\(.+\\)");
        for (SvgPicture p : everyKind("a-").keySet()) {
            Set<String> texts = texts(parse(p.svg()));
            assertFalse(p.axisLabels().isEmpty(), p.id());
            for (String label : p.axisLabels()) {
                assertTrue(unit.matcher(label).matches(), p.id() + ": no unit in " + label);
                assertTrue(texts.contains(label), p.id() + ": " + label + " is not drawn; texts " + texts);
            }
        }
        SvgPicture r = record("labels", 3_000);
        assertEquals(List.of("time (s)", "angle (°)", "residual (°)"), r.axisLabels());
        Set<String> texts = texts(parse(r.svg()));
        assertTrue(texts.contains("release") && texts.contains("stop"), texts.toString());
        double[][] s = swing(3_000);
        SvgPicture noStop = Plots.sessionRecord("nostop", "t", s[0], s[1], s[2], s[3], 2.0, Double.NaN);
        assertFalse(texts(parse(noStop.svg())).contains("stop"));
    }

    @Test
    void aLegendNamesTheSeriesOnlyWhereThereIsMoreThanOne() throws Exception {
        Set<String> one = texts(parse(Plots.timeSeries("one", "t", "angle (°)", List.of(line("alone", 1, 0.1))).svg()));
        assertFalse(one.contains("alone"), one.toString());
        Set<String> two = texts(parse(Plots.timeSeries("two", "t", "angle (°)",
                List.of(line("first", 1, 0.1), line("second", 1, 0.2))).svg()));
        assertTrue(two.contains("first") && two.contains("second"), two.toString());
    }

    @Test
    void twoPicturesNeverShareAnIdAndEveryReferenceStaysInside() throws Exception {
        Set<String> seen = new HashSet<>();
        List<SvgPicture> pictures = new ArrayList<>(everyKind("one-").keySet());
        pictures.add(record("two-record", 3_000));
        for (SvgPicture p : pictures) {
            Document d = parse(p.svg());
            List<String> ids = ids(d);
            assertTrue(ids.size() > 2, p.id() + " has clip paths: " + ids);
            for (String id : ids) {
                assertTrue(seen.add(id), "the id " + id + " appears twice");
                assertTrue(id.startsWith(p.id()), id + " is not prefixed with " + p.id());
            }
            Matcher m = URL_REF.matcher(p.svg());
            while (m.find()) {
                assertTrue(ids.contains(m.group(1)), p.id() + " refers to #" + m.group(1) + " it does not hold");
            }
        }
    }

    @Test
    void nothingOutsideThePictureIsReferred() {
        for (SvgPicture p : everyKind("x-").keySet()) {
            String rest = p.svg().replace("xmlns='" + SVG + "'", "").replace("xmlns=\"" + SVG + "\"", "");
            assertFalse(rest.contains("http"), p.id() + " names a web address");
            assertFalse(rest.contains("href"), p.id() + " refers to a file");
            assertFalse(rest.contains("<image"), p.id() + " holds an image");
            assertFalse(rest.contains("@import") || rest.contains("@font-face"), p.id() + " loads a font");
            assertTrue(rest.contains("sans-serif"), p.id() + " names its plain font");
        }
    }

    @Test
    void onlyBlackWhiteAndGreysAreUsed() {
        for (SvgPicture p : everyKind("g-").keySet()) {
            Matcher m = RGB.matcher(p.svg().replace(" ", ""));
            int colours = 0;
            while (m.find()) {
                colours++;
                assertTrue(m.group(1).equals(m.group(2)) && m.group(2).equals(m.group(3)),
                        p.id() + " uses the colour " + m.group());
            }
            assertTrue(colours > 5, p.id() + " states its paints");
            assertFalse(p.svg().contains("Gradient"), p.id() + " paints a gradient");
        }
    }

    @Test
    void aLongRecordStaysSmallWithShortCoordinates() throws Exception {
        SvgPicture p = record("long", 300_000);
        int bytes = p.svg().getBytes(StandardCharsets.UTF_8).length;
        assertTrue(bytes < 300_000, "the 300 000-sample record makes " + bytes + " bytes (stated bound 300 kB)");
        Document d = parse(p.svg());
        assertEquals(3, series(d).size());
        for (Element path : elements(d, "path")) {
            assertFalse(LONG_DECIMAL.matcher(path.getAttribute("d")).find(), "more than two decimal places in a path");
        }
        // at most four points survive a pixel column of the data area the series is clipped to
        Map<String, Element> clips = new LinkedHashMap<>();
        for (Element c : elements(d, "clipPath")) {
            clips.put(c.getAttribute("id"), c);
        }
        for (Element g : elements(d, "g")) {
            if (!"series".equals(g.getAttribute("class"))) {
                continue;
            }
            int points = 0;
            double columns = 0;
            for (Element e : elements(g, "*")) {
                Matcher clip = URL_REF.matcher(e.getAttribute("clip-path"));
                if (clip.find()) {
                    columns = Math.max(columns, xSpan(elements(clips.get(clip.group(1)), "path").get(0)));
                }
                if ("path".equals(e.getLocalName())) {
                    points += e.getAttribute("d").split("[ML]").length - 1;
                }
            }
            String name = g.getAttribute("data-series");
            assertTrue(columns > 600 && columns < 720, name + " is clipped to a data area " + columns + " px wide");
            assertTrue(points > 500 && points <= 4 * Math.ceil(columns), name + " draws " + points + " points");
        }
    }

    /** How wide the outline of a path is (the largest minus the smallest x). */
    private static double xSpan(Element path) {
        String[] numbers = path.getAttribute("d").replaceAll("[A-Za-z]", " ").trim().split("[ ,]+");
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i + 1 < numbers.length; i += 2) {
            double x = Double.parseDouble(numbers[i]);
            lo = Math.min(lo, x);
            hi = Math.max(hi, x);
        }
        return hi - lo;
    }

    @Test
    void whatCannotBeDrawnIsRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> Plots.sessionRecord("r", "t", new double[3], new double[3], new double[2], new double[3], 0, 1));
        assertThrows(IllegalArgumentException.class,
                () -> Plots.partShares("s", "t", List.of("a", "b"), new double[] {1}));
        assertThrows(IllegalArgumentException.class,
                () -> Plots.energyShares("e", "t", List.of("a"), new double[] {1}, new double[0]));
        assertThrows(IllegalArgumentException.class,
                () -> Plots.timeSeries("two words", "t", "angle (°)", List.of(line("a", 1, 1))));
        assertThrows(IllegalArgumentException.class,
                () -> Plots.timeSeries("dup", "t", "angle (°)", List.of(line("a", 1, 1), line("a", 2, 1))));
        assertThrows(IllegalArgumentException.class, () -> new Curve("c", new double[2], new double[3]));
    }

    /**
     * The control chart marks a unit beyond the limits apart from the others, and a chart with
     * every unit within them draws no "beyond limits" series.
     */
    @Test
    void theControlChartMarksTheUnitsBeyondTheLimits() throws Exception {
        double[] v = {0.010, 0.011, 0.0105, 0.0098, 0.030, 0.0102};
        SvgPicture beyond = Plots.controlChart("cc", "chart", "b (N·m·s/rad)", v, 0.0136, 0.0051, 0.0221);
        assertEquals(Set.of("in order", "within limits", "beyond limits"), series(parse(beyond.svg())));
        assertTrue(texts(parse(beyond.svg())).containsAll(Set.of("UCL", "LCL", "center")), texts(parse(beyond.svg())).toString());
        SvgPicture within = Plots.controlChart("cw", "chart", "b (N·m·s/rad)", v, 0.0136, 0.0, 0.04);
        assertEquals(Set.of("in order", "within limits"), series(parse(within.svg())));
    }

    /**
     * Bins by hand: ten values 1 2 2 3 3 3 4 4 4 4 make ⌈log₂ 10⌉ + 1 = 5 bins of width 0.6 from 1
     * (Sturges' rule), holding 1, 2, 0, 3 and 4 values (the largest value in the last bin).
     */
    @Test
    void histogramBinsFollowSturgesRule() {
        Plots.Bins b = Plots.bins(new double[] {4, 1, 2, 3, 4, 2, 3, 4, 3, 4});
        assertEquals(1, b.start(), 1e-12);
        assertEquals(0.6, b.width(), 1e-12);
        assertEquals(List.of(1, 2, 0, 3, 4), java.util.Arrays.stream(b.counts()).boxed().toList());
        Plots.Bins one = Plots.bins(new double[] {2, 2, 2});
        assertEquals(1, one.counts().length);
        assertEquals(3, one.counts()[0]);
    }
}
