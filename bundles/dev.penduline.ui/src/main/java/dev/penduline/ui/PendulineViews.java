package dev.penduline.ui;

/** Identifiers of Penduline's views and perspective, and of the platform views it arranges. */
public final class PendulineViews {

    /** The perspective that opens first. */
    public static final String PERSPECTIVE = "dev.penduline.ui.perspective";
    /** The workspace tree of mechanism projects. */
    public static final String PROJECT_FILES = "dev.penduline.ui.projectFiles";
    /** The start page: what Penduline does and where to begin. */
    public static final String SWING_DESK = "dev.penduline.ui.swingDesk";
    /** The mechanism selected in Project Files: totals, per-part contributions, warnings. */
    public static final String MECHANISM = "dev.penduline.ui.mechanism";
    /** A test session's record plotted with its turning points, or a predicted swing. */
    public static final String SWING_CHART = "dev.penduline.ui.swingChart";
    /** The friction fits stored in a mechanism file, and the action that fits its sessions. */
    public static final String FRICTION = "dev.penduline.ui.friction";
    /** The swing trial: release and friction on sliders, re-forecast live, stored as a hypothesis. */
    public static final String WHAT_IF = "dev.penduline.ui.whatIf";
    /** The wizard that creates a mechanism project (File › New). */
    public static final String NEW_MECHANISM_PROJECT = "dev.penduline.ui.newMechanismProject";
    /** The mechanism editor, for .penduline files. */
    public static final String MECHANISM_EDITOR = "dev.penduline.ui.mechanismEditor";

    /** The platform's Properties view. */
    public static final String PROPERTIES = "org.eclipse.ui.views.PropertySheet";
    /** The platform's Problems view. */
    public static final String PROBLEMS = "org.eclipse.ui.views.ProblemView";
    /** The platform's Progress view. */
    public static final String PROGRESS = "org.eclipse.ui.views.ProgressView";

    private PendulineViews() {
    }
}
