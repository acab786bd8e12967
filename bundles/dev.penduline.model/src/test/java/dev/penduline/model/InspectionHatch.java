package dev.penduline.model;

import dev.penduline.model.naming.NamedElements;

/**
 * An invented inspection hatch for tests: a steel lid hanging from a hinge along the z axis,
 * with a stiffening rib pair, a handle, a latch given as CAD mass properties, a hinge pin, and an
 * inspection hole cut out of the lid; one friction hypothesis, one session and one stored fit.
 * Not a real product; the numbers are plausible, not measured.
 */
public final class InspectionHatch {

    /** Lid height in the plane of swing, along −y (m). */
    public static final double LID_HEIGHT = 0.4;
    /** Lid length along the hinge, z (m). */
    public static final double LID_LENGTH = 0.6;
    /** Lid thickness, x (m). */
    public static final double LID_THICKNESS = 0.004;
    /** Density of structural steel (kg/m³), a common handbook value. */
    public static final double STEEL_DENSITY = 7850;

    private InspectionHatch() {
    }

    /**
     * The whole fixture.
     *
     * @return a new mechanism, not in a resource
     */
    public static Mechanism create() {
        final Mechanism m = NamedElements.mechanism("Inspection hatch");
        m.setDescription("Floor-level inspection hatch, steel lid hinged at its top edge.");
        addLid(m);

        final Part rib = NamedElements.addPart(m, "Rib");
        rib.setShape(ShapeKind.SLENDER_ROD);
        rib.setShapeAxis(ShapeAxis.Y);
        rib.setLength(0.38);
        rib.setMass(0.45);
        rib.setCentroidX(0.012);
        rib.setCentroidY(-0.2);
        rib.setQuantity(2);
        rib.setMassTolerance(0.02);

        final Part handle = NamedElements.addPart(m, "Handle");
        handle.setMass(0.3);
        handle.setCentroidX(0.035);
        handle.setCentroidY(-0.37);

        final Part pin = NamedElements.addPart(m, "Hinge pin");
        pin.setShape(ShapeKind.HOLLOW_CYLINDER);
        pin.setRadius(0.006);
        pin.setInnerRadius(0.003);
        pin.setLength(LID_LENGTH);
        pin.setMass(0.1);

        final Part hole = NamedElements.addPart(m, "Inspection hole");
        hole.setShape(ShapeKind.CYLINDER);
        hole.setShapeAxis(ShapeAxis.X);
        hole.setRadius(0.05);
        hole.setLength(LID_THICKNESS);
        hole.setDensity(STEEL_DENSITY);
        hole.setCentroidY(-0.25);
        hole.setCentroidZ(0.15);
        hole.setCutout(true);

        final Part latch = NamedElements.addPart(m, "Latch");
        latch.setShape(ShapeKind.MASS_PROPERTIES);
        latch.setMass(0.25);
        latch.setCentroidX(0.02);
        latch.setCentroidY(-0.39);
        latch.setCentroidZ(0.2);
        latch.setIxx(1.2e-4);
        latch.setIyy(2.1e-4);
        latch.setIzz(2.6e-4);
        latch.setIxy(-1.5e-5);

        addFriction(m);
        addSession(m);
        addFit(m);
        return m;
    }

    /**
     * Only the lid: a uniform steel plate hanging from its top edge, mass from the density.
     *
     * @param m the mechanism to add it to
     * @return the lid part
     */
    public static Part addLid(Mechanism m) {
        final Part lid = NamedElements.addPart(m, "Lid plate");
        lid.setShape(ShapeKind.BOX);
        lid.setLength(LID_THICKNESS);
        lid.setWidth(LID_HEIGHT);
        lid.setHeight(LID_LENGTH);
        lid.setDensity(STEEL_DENSITY);
        lid.setCentroidY(-LID_HEIGHT / 2);
        lid.setDimensionTolerance(0.0005);
        return lid;
    }

    private static void addFriction(Mechanism m) {
        final FrictionHypothesis h = NamedElements.addHypothesis(m, "Viscous and Coulomb");
        final FrictionTerm viscous = NamedElements.addTerm(h, FrictionKind.VISCOUS);
        viscous.setValue(0.01);
        final FrictionTerm coulomb = NamedElements.addTerm(h, FrictionKind.COULOMB);
        coulomb.setValue(0.05);
        coulomb.setUpperBound(1.0);
        final FrictionTerm stiction = NamedElements.addTerm(h, FrictionKind.STICTION);
        stiction.setValue(0.08);
        stiction.setFixed(true);
    }

    private static void addSession(Mechanism m) {
        final TestSession s = NamedElements.addSession(m, "Release at 30°", "records/release-30.csv");
        s.setTimeColumnName("t");
        s.setAngleColumnName("angle");
        s.setAngleUnit(AngleUnit.DEGREE);
        s.setContentHash("3a7bd3e2360a3d29eea436fcfb7e44c735d117c42d1c1835420b6b9942dd4f1b");
        s.setReleaseAngle(Math.toRadians(30));
        s.setNotes("Hinge greased; 21 °C.");
    }

    private static void addFit(Mechanism m) {
        final FitResult f = NamedElements.addFitResult(m, "First fit", "2026-09-14T10:15:30Z");
        f.setHypothesisId("viscous-and-coulomb");
        f.getSessionIds().add("release-at-30");
        f.getTermIds().add("viscous");
        f.getTermIds().add("coulomb");
        f.getEstimates().add(estimate("viscous", 0.0123, 0.0008));
        f.getEstimates().add(estimate("coulomb", 0.047, 0.003));
        f.getCorrelationParameters().add("viscous");
        f.getCorrelationParameters().add("coulomb");
        f.getCorrelations().add(1.0);
        f.getCorrelations().add(-0.62);
        f.getCorrelations().add(-0.62);
        f.getCorrelations().add(1.0);
        f.setCalculatedInertia(0.41);
        f.setFittedInertia(0.43);
        final SessionFit sf = PendulineFactory.eINSTANCE.createSessionFit();
        sf.setSessionId("release-at-30");
        sf.setInitialAngle(0.521);
        sf.setReleaseTime(1.284);
        sf.setAngleOffset(-0.004);
        sf.setRmsResidual(0.0021);
        f.getSessionFits().add(sf);
        final TermSetScore score = PendulineFactory.eINSTANCE.createTermSetScore();
        score.getTermIds().add("viscous");
        score.getTermIds().add("coulomb");
        score.setAic(-4210.5);
        score.setBic(-4188.2);
        score.setRmsResidual(0.0021);
        f.getComparisons().add(score);
        f.setDominantLoss("coulomb");
        f.getEnergyShares().add(share("viscous", 0.35));
        f.getEnergyShares().add(share("coulomb", 0.65));
        final Setting setting = PendulineFactory.eINSTANCE.createSetting();
        setting.setKey("max-iterations");
        setting.setValue("200");
        f.getSettings().add(setting);
    }

    private static Estimate estimate(String parameter, double value, double error) {
        final Estimate e = PendulineFactory.eINSTANCE.createEstimate();
        e.setParameter(parameter);
        e.setValue(value);
        e.setStandardError(error);
        return e;
    }

    private static EnergyShare share(String term, double value) {
        final EnergyShare s = PendulineFactory.eINSTANCE.createEnergyShare();
        s.setTermId(term);
        s.setShare(value);
        return s;
    }
}
