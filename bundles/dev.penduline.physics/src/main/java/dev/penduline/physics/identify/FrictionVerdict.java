package dev.penduline.physics.identify;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Which loss dominates, said only as far as the fit supports it.
 *
 * <p>Rules, in order:
 * <ol>
 * <li>A fit that did not converge, or whose residuals are clearly above the records' noise
 * floor ({@link Goodness}), gets no verdict: {@link Kind#WITHHELD}.</li>
 * <li>One loss is {@link Kind#DOMINANT} when its share of the dissipated energy leads the
 * next one by at least the margin ({@link FitSettings#verdictMargin()}, default 15 percentage
 * points, "common practice" for calling one of two contributions the larger by a clear amount)
 * and by more than twice the standard deviation of that difference, so that the lead is
 * neither small nor within the uncertainty of the shares.</li>
 * <li>Otherwise the loss is {@link Kind#MIXED}, and the leading losses are named in order.</li>
 * </ol>
 *
 * @param kind       dominant, mixed, or withheld
 * @param dominant   the dominant loss; null unless {@link Kind#DOMINANT}
 * @param leading    the losses with a non-zero share, largest first
 * @param lead       share of the first minus share of the second (fraction)
 * @param leadSigma  standard deviation of that difference (NaN when unknown)
 * @param margin     the margin applied (fraction)
 */
public record FrictionVerdict(Kind kind, FrictionTerm dominant, List<FrictionTerm> leading, double lead,
        double leadSigma, double margin) {

    /** The kinds of verdict. */
    public enum Kind {
        /** One loss leads clearly. */
        DOMINANT,
        /** No loss leads clearly: the losses are named in order. */
        MIXED,
        /** No verdict: the fit failed or the model does not describe the records. */
        WITHHELD
    }

    /** Freezes the list. */
    public FrictionVerdict {
        leading = List.copyOf(leading);
    }

    /**
     * Judges the energy shares of a fit.
     *
     * @param shares        the shares with their σ
     * @param replicates    the shares of each resampling refit or covariance draw ({viscous, coulomb,
     *                      drag} each), for the σ of the lead; may be empty
     * @param margin        the margin (fraction)
     * @param trustworthy   whether the fit converged and describes its records
     * @return the verdict
     */
    static FrictionVerdict judge(EnergyShares shares, List<double[]> replicates, double margin,
            boolean trustworthy) {
        final List<FrictionTerm> order = new ArrayList<>();
        for (FrictionTerm t : List.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.DRAG)) {
            if (shares.share(t) > 0) {
                order.add(t);
            }
        }
        order.sort(Comparator.comparingDouble(shares::share).reversed());
        if (!trustworthy || order.isEmpty()) {
            return new FrictionVerdict(Kind.WITHHELD, null, order, Double.NaN, Double.NaN, margin);
        }
        final FrictionTerm first = order.get(0);
        final FrictionTerm second = order.size() > 1 ? order.get(1) : null;
        final double lead = shares.share(first) - (second == null ? 0 : shares.share(second));
        final double sigma = second == null ? 0 : leadSigma(replicates, first, second);
        final boolean clear = lead >= margin && !(lead <= 2 * sigma);
        return new FrictionVerdict(clear ? Kind.DOMINANT : Kind.MIXED, clear ? first : null, order, lead, sigma,
                margin);
    }

    private static double leadSigma(List<double[]> replicates, FrictionTerm first, FrictionTerm second) {
        if (replicates.size() < 2) {
            return Double.NaN;
        }
        final List<double[]> leads = new ArrayList<>();
        for (double[] r : replicates) {
            leads.add(new double[] {r[index(first)] - r[index(second)]});
        }
        return BlockBootstrap.spread(leads, 1)[0];
    }

    static int index(FrictionTerm t) {
        return switch (t) {
            case VISCOUS -> 0;
            case COULOMB -> 1;
            case DRAG -> 2;
            case STICTION -> throw new IllegalArgumentException("stiction dissipates no energy of its own");
        };
    }
}
