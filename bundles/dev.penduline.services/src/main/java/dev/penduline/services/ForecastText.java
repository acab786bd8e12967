package dev.penduline.services;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import dev.penduline.physics.forecast.AnglePass;
import dev.penduline.physics.forecast.FigureBand;
import dev.penduline.physics.forecast.ForecastRequest;
import dev.penduline.physics.forecast.SwingForecast;
import dev.penduline.physics.motion.FrictionTorques;
import dev.penduline.physics.motion.SwingEnergy;
import dev.penduline.physics.units.Unit;
import dev.penduline.services.present.Figures;

/**
 * A forecast in words, the same for {@code penduline predict}, its report section and the
 * workbench's report: the friction and inertia used, the release, when it settles, the rest band,
 * the peak speed, the first passage through the chosen angle, where the energy went, each figure
 * with its band, the design answer, and the caution.
 */
public final class ForecastText {

    private ForecastText() {
    }

    /**
     * The readable forecast line by line, without the caution (a document that includes it has its own).
     *
     * @param m      the mechanism
     * @param o      the forecast
     * @param design the design answer, when a spec was given
     * @return the lines
     */
    public static List<String> lines(MechanismSource m, MechanismForecast.Outcome o, Optional<SpecDesign.Answer> design) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        write(m, o, design, out);
        out.flush();
        return text.toString().lines().filter(l -> !l.equals(Cautions.HAZARD) && !l.equals(Cautions.TEXT)).toList();
    }

    private static void writeDesign(SpecDesign.Answer d, PrintWriter out) {
        out.println();
        String what = d.term() == SpecDesign.Term.VISCOUS ? "viscous damping" : "dry friction torque";
        String figure = d.figure() >= 1e11 ? "never" : Figures.significant(d.figure());
        if (Double.isNaN(d.added())) {
            out.println("  design: " + d.reason());
            return;
        }
        out.printf(Locale.ROOT, "  design: add %s %s of %s (total %s %s)%s%n", Figures.significant(d.added()), d.term().unit(),
                what, Figures.significant(d.total()), d.term().unit(), d.addedBand().map(b -> " (band " + Figures
                        .significant(b.low()) + " to " + Figures.significant(b.high()) + " over " + SpecDesign.SENSITIVITY_DRAWS
                        + " draws of the fit)").orElse(""));
        out.printf(Locale.ROOT, "    re-simulated %s: %s (without it: %s); %s%n", d.figureName(), figure,
                d.baseline() >= 1e11 ? "never" : Figures.significant(d.baseline()), d.meets() ? "meets the spec" : "does NOT meet"
                        + " the spec");
        out.println("    " + d.reason());
    }

    /**
     * Writes the readable forecast, the design answer when there is one, and the caution last.
     *
     * @param m      the mechanism
     * @param o      the forecast
     * @param design the design answer, when a spec was given
     * @param out    where to
     */
    public static void write(MechanismSource m, MechanismForecast.Outcome o, Optional<SpecDesign.Answer> design,
            PrintWriter out) {
        SwingForecast n = o.nominal();
        MechanismForecast.Bands b = o.bands();
        ForecastRequest r = o.request();
        FrictionTorques f = o.source().friction();
        double deg = Unit.DEGREE.fromSi(1);
        out.println("Prediction for " + m.label());
        out.println("  friction: " + o.source().description());
        out.printf(Locale.ROOT, "    viscous %s N·m·s/rad, Coulomb %s N·m, static %s N·m, drag %s N·m·s²/rad²%n",
                Figures.significant(f.viscous()), Figures.significant(f.coulomb()), Figures.significant(f.staticTorque()),
                Figures.significant(f.drag()));
        out.printf(Locale.ROOT, "  inertia: J0 %s kg·m² (%s)%n", Figures.significant(o.pivotInertia()), o.inertiaSource());
        out.printf(Locale.ROOT, "  released at %s°%s; settle band ±%s°%n", Figures.significant(r.releaseAngle() * deg),
                r.releaseVelocity() == 0 ? " from rest" : " at " + Figures.significant(r.releaseVelocity() * deg) + " °/s",
                Figures.significant(r.band() * deg));
        out.println("  bands: " + o.bandDefinition());
        out.println();
        if (n.settled()) {
            out.printf(Locale.ROOT, "  settles inside the band after %s s%s%n", Figures.significant(n.settleTime()),
                    range(b.settleTime(), 1));
            out.printf(Locale.ROOT, "  half-swings before that: %d%s%n", n.halfSwings(), wholeRange(b.halfSwings()));
            if (!n.note().isEmpty()) {
                out.println("  note: " + n.note());
            }
        } else {
            out.println("  does not settle inside the band: " + n.note());
        }
        out.printf(Locale.ROOT, "  rest band: %s° to %s°%s%n", Figures.significant(n.restBand().lower() * deg),
                Figures.significant(n.restBand().upper() * deg),
                n.restBand().anywhere() ? " (static friction can hold it at any angle)" : restRange(b, deg));
        if (Double.isFinite(n.restAngle())) {
            out.printf(Locale.ROOT, "  comes to rest at %s°%n", Figures.significant(n.restAngle() * deg));
        }
        out.printf(Locale.ROOT, "  peak angular velocity: %s rad/s%s at %s s, at %s°%n",
                Figures.significant(n.peakAngularVelocity()), range(b.peakVelocity(), 1),
                Figures.significant(n.peakTime()), Figures.significant(n.peakAngle() * deg));
        out.printf(Locale.ROOT, "  largest overshoot: %s°%s%n", Figures.significant(n.maxOvershoot() * deg),
                range(b.maxOvershoot(), deg));
        if (!Double.isNaN(r.passAngle())) {
            Optional<AnglePass> pass = n.pass();
            if (pass.isEmpty()) {
                out.printf(Locale.ROOT, "  never passes %s°%n", Figures.significant(r.passAngle() * deg));
            } else {
                AnglePass p = pass.get();
                out.printf(Locale.ROOT, "  first passes %s° at %s s: %s rad/s%s%n", Figures.significant(r.passAngle() * deg),
                        Figures.significant(p.time()), Figures.significant(p.angularVelocity()), range(b.passVelocity(), 1));
                if (b.tipSpeed() != null) {
                    out.printf(Locale.ROOT, "    speed of the point at %s m: %s m/s%s%n", Figures.significant(r.radius()),
                            Figures.significant(p.tipSpeed()), range(b.tipSpeed(), 1));
                }
                out.printf(Locale.ROOT, "    kinetic energy: %s J%s%n", Figures.significant(p.kineticEnergy()),
                        range(b.passEnergy(), 1));
            }
        }
        SwingEnergy e = n.energy();
        out.printf(Locale.ROOT, "  energy: released with %s J; taken by viscous %s J, Coulomb %s J, drag %s J; %s J left"
                + " after %s s%n", Figures.significant(e.initial()), Figures.significant(e.viscous()),
                Figures.significant(e.coulomb()), Figures.significant(e.drag()), Figures.significant(e.remaining()),
                Figures.significant(n.simulatedTime()));
        for (String note : o.notes()) {
            out.println("  note: " + note);
        }
        design.ifPresent(d -> writeDesign(d, out));
        out.println();
        out.println(Cautions.HAZARD);
        out.println(Cautions.TEXT);
    }

    private static String range(FigureBand band, double scale) {
        if (band == null || Double.isNaN(band.low())) {
            return "";
        }
        return " (band " + Figures.significant(band.low() * scale) + " to " + Figures.significant(band.high() * scale) + ")";
    }

    private static String wholeRange(FigureBand band) {
        if (band == null || Double.isNaN(band.low())) {
            return "";
        }
        return String.format(Locale.ROOT, " (band %d to %d)", Math.round(band.low()), Math.round(band.high()));
    }

    private static String restRange(MechanismForecast.Bands b, double deg) {
        if (Double.isNaN(b.restLower().low()) || b.restLower().low() == b.restLower().high()) {
            return "";
        }
        return " (upper end's band " + Figures.significant(b.restUpper().low() * deg) + " to "
                + Figures.significant(b.restUpper().high() * deg) + ")";
    }
}
