package dev.penduline.services;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

import dev.penduline.model.EnergyShare;
import dev.penduline.model.FitResult;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.SessionFit;
import dev.penduline.model.Setting;
import dev.penduline.model.TestSession;

/**
 * The words of a stored fit: what a fit stored since the reports exist says (the verdict as
 * {@code penduline fit} wrote it, the energy shares with their σ, each record against its noise
 * floor) and what an older stored fit says instead (that it was not stored). The expected texts
 * are written out by hand from the rounding rule of JCGM 100:2008 §7.2.6 (two significant digits
 * of the uncertainty, the value to the same place).
 */
class StoredFitTextTest {

    private static final PendulineFactory F = PendulineFactory.eINSTANCE;

    private static void setting(FitResult r, String key, String value) {
        Setting s = F.createSetting();
        s.setKey(key);
        s.setValue(value);
        r.getSettings().add(s);
    }

    private static FitResult stored(boolean withEvidence) {
        FitResult r = StoredFitTest.fit("fit-a");
        r.setComputedAt("2026-12-03T10:00:00Z");
        for (String[] e : new String[][] {{"viscous", "0.3095"}, {"coulomb", "0.2779"}, {"drag", "0.4126"}}) {
            EnergyShare s = F.createEnergyShare();
            s.setTermId(e[0]);
            s.setShare(Double.parseDouble(e[1]));
            r.getEnergyShares().add(s);
        }
        r.setDominantLoss("mixed");
        SessionFit sf = F.createSessionFit();
        sf.setSessionId("s1");
        sf.setInitialAngle(Math.toRadians(25));
        sf.setReleaseTime(1.5);
        sf.setAngleOffset(Math.toRadians(2.7));
        sf.setRmsResidual(Math.toRadians(0.032));
        r.getSessionFits().add(sf);
        setting(r, "resamples", "40");
        if (withEvidence) {
            setting(r, FitRecorder.VERDICT, "mixed: no loss leads the next by 15 percentage points");
            setting(r, "energy-dissipated", "8.2345");
            setting(r, "energy-sigma-viscous", "0.0123");
            setting(r, "energy-sigma-coulomb", "0.0071");
            setting(r, "energy-sigma-drag", "0.0151");
            setting(r, "rms-residual", String.valueOf(Math.toRadians(0.032)));
            setting(r, "samples", "90000");
            setting(r, "noise-floor", String.valueOf(Math.toRadians(0.037)));
            setting(r, "noise-ratio", "0.84");
            setting(r, "noise-limit", "1.5");
            setting(r, "noise-passed", "true");
            setting(r, "noise-floor[s1]", String.valueOf(Math.toRadians(0.0375)));
            setting(r, "residual-to-noise[s1]", "0.8412");
            setting(r, "stop-note", "from the 10° release's stop");
        }
        setting(r, "warning-1", "c and b correlate at -0.97");
        return r;
    }

    private static List<TestSession> sessions() {
        TestSession s = F.createTestSession();
        s.setId("s1");
        s.setName("Release at 25°");
        return List.of(s);
    }

    @Test
    void aFitStoredWithItsEvidenceSaysWhatTheFitSaid() {
        StoredFitText t = StoredFitText.of(stored(true), sessions());
        assertEquals("Verdict: mixed: no loss leads the next by 15 percentage points", t.verdict());
        // 30.95 % with u = 1.23 % → 31.0 ± 1.2 %; 27.79 ± 0.71 %; 41.26 ± 1.51 % → 41.3 ± 1.5 %; 8.2345 J half-up → 8.235
        assertEquals("Energy dissipated: viscous 31.0 ± 1.2 %, Coulomb 27.79 ± 0.71 %, drag 41.3 ± 1.5 % of 8.235 J",
                t.shares());
        StoredFitText.SessionRow row = t.sessions().get(0);
        assertEquals("Release at 25°", row.session());
        assertEquals("0.03750", row.noiseFloor());
        assertEquals("0.84", row.ratio());
        assertTrue(t.noise().startsWith("Against the noise: residual rms 0.03200° against a noise floor of 0.03700°"),
                t.noise());
        assertTrue(t.noise().endsWith("the model describes the records"), t.noise());
        assertEquals("Static friction from the stops: Ts between 0.06000 and 0.09000 N·m (from the 10° release's stop)",
                t.stopBand());
        assertEquals("Residual rms 0.03200° over 90000 samples; 40 bootstrap refits.", t.totals());
        assertEquals(List.of("c and b correlate at -0.97"), t.warnings());
        // the evidence is not repeated among the settings; the settings keep their stored order
        List<String> keys = t.settings().stream().map(Map.Entry::getKey).toList();
        assertEquals(List.of("inertia", "resamples"), keys);
    }

    @Test
    void anOlderFitSaysWhatWasNotStored() {
        StoredFitText t = StoredFitText.of(stored(false), sessions());
        assertEquals("Verdict: mixed: no loss leads the next by a clear margin (see the shares)", t.verdict());
        assertEquals("Energy dissipated: viscous 31.0 %, Coulomb 27.8 %, drag 41.3 %", t.shares());
        assertEquals("–", t.sessions().get(0).noiseFloor());
        assertEquals("–", t.sessions().get(0).ratio());
        assertEquals("", t.noise());
        assertEquals("", t.totals());
        assertFalse(t.stopBand().isEmpty(), "the stop band was stored before the evidence was");
    }
}
