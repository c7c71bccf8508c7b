package revisit.verification;

import boofcv.alg.geo.DecomposeEssential;
import boofcv.alg.geo.DecomposeHomography;
import georegression.struct.point.Vector3D_F64;
import georegression.struct.se.Se3_F64;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;

/**
 * Relative pose from a calibrated model: decomposition (BoofCV), choice of the decomposition by the cheirality
 * of the inliers, Levenberg-Marquardt refinement on the inliers, a cheirality check over all final inliers and
 * the information matrix. Holds decomposition state: one instance per thread.
 */
final class PoseRecovery {

    /** Pose stage result. */
    record Recovered(Outcome outcome, int[] inliers, Optional<RelativePose> pose, ResidualStats errors) {
    }

    /**
     * Inlier cuts, as multiples of the configured one, of the refinement rounds: least squares on a wider set
     * first, then shrinking to the final cut, so the fit is not locked to the points the first hypothesis happened
     * to keep (iterative least squares of Lebeda, Matas &amp; Chum, "Fixing the locally optimized RANSAC",
     * BMVC 2012). Three rounds measured as accurate as five on Middlebury templeSparseRing (51 of 60 pairs within
     * 3.5 degrees over seeds 1-6) at two thirds of the cost.
     */
    private static final double[] CUT_SCHEDULE = {2.0, 1.0, 1.0};

    /** Frobenius distance of unit essential matrices below which two RANSAC starts count as one. */
    private static final double SAME_GEOMETRY = 0.05;

    private final VerificationConfig config;
    private final DecomposeEssential essentialDecomposition = new DecomposeEssential();
    /** Relative MSAC cost difference under which two plane decompositions count as a tie (common practice). */
    private static final double PLANE_TIE = 0.05;
    /** Share of a plane's inliers that must see it in front for a decomposition to be physical (noise margin). */
    private static final double VISIBLE_SHARE = 0.9;

    private final DecomposeHomography homographyDecomposition = new DecomposeHomography();

    PoseRecovery(VerificationConfig config) {
        this.config = config;
    }

    /** From an essential-matrix fit given as the pixel fundamental matrix {@code fit.model()}. */
    Recovered fromEssential(PointPairs p, AdaptiveRansac.Fit fit) {
        List<double[]> starts = new ArrayList<>();
        starts.add(fit.model());
        for (double[] candidate : fit.earlier()) {
            if (starts.stream().noneMatch(s -> sameEpipolarGeometry(p, s, candidate))) {
                starts.add(candidate);
            }
        }
        double bestCost = Double.POSITIVE_INFINITY;
        Recovered best = new Recovered(Outcome.DEGENERATE, indices(fit.inliers()), Optional.empty(),
                ResidualStats.none());
        for (double[] start : starts) {
            Optional<Recovered> r = refineFrom(p, start).map(x -> finish(p, x.inliers(), x.state(), false));
            double cost = r.map(x -> finalCost(p, x)).orElse(Double.POSITIVE_INFINITY);
            if (cost < bestCost) {
                bestCost = cost;
                best = r.get();
            }
        }
        return best;
    }

    /**
     * True when two pixel fundamental matrices give nearly the same essential matrix: Frobenius distance below 0.05
     * after scaling both to unit norm, up to sign (a start that close converges to the same pose; common practice).
     */
    private static boolean sameEpipolarGeometry(PointPairs p, double[] f1, double[] f2) {
        double[] e1 = p.essentialFromFundamental(f1);
        double[] e2 = p.essentialFromFundamental(f2);
        double n1 = Math.sqrt(Mat3.dot9(e1, e1));
        double n2 = Math.sqrt(Mat3.dot9(e2, e2));
        double plus = 0;
        double minus = 0;
        for (int k = 0; k < 9; k++) {
            double a = e1[k] / n1;
            double b = e2[k] / n2;
            plus += (a - b) * (a - b);
            minus += (a + b) * (a + b);
        }
        return Math.min(plus, minus) < SAME_GEOMETRY * SAME_GEOMETRY;
    }

    /**
     * MSAC cost of a finished pose over all matches: inliers in front of both cameras pay their squared Sampson
     * distance, every other match the squared cut.
     */
    private double finalCost(PointPairs p, Recovered r) {
        double cutSq = config.inlierThresholdPx() * config.inlierThresholdPx();
        if (r.pose().isEmpty()) {
            return r.outcome().accepted() ? Double.POSITIVE_INFINITY : p.count * cutSq;
        }
        RelativePose pose = r.pose().get();
        double[] f = p.fundamentalFromEssential(Mat3.mul(Mat3.skew(pose.translationDirection().orElseThrow()),
                pose.rotation()));
        double cost = (p.count - r.inliers().length) * cutSq;
        for (int i : r.inliers()) {
            cost += Math.min(p.epipolarSq(f, i), cutSq);
        }
        return cost;
    }

    /** A refined pose, its inliers and its pixel fundamental matrix. */
    private record Refined(double[] state, int[] inliers, double[] fundamental) {
    }

    /**
     * Decomposition, cheirality and the refinement rounds from one RANSAC model (pixel fundamental matrix).
     * Several starts are refined (the final best and the ones it replaced) and the lowest MSAC cost kept: on weak
     * geometry the best minimal-sample model can lie in a wrong basin that an earlier one does not (measured on
     * Middlebury templeSparseRing, docs/VERIFICATION.md).
     */
    private Optional<Refined> refineFrom(PointPairs p, double[] fundamental) {
        double thresholdSq = config.inlierThresholdPx() * config.inlierThresholdPx();
        boolean[] initial = new boolean[p.count];
        AdaptiveRansac.classify(p.count, fundamental, p::epipolarSq, thresholdSq, initial);
        int[] inliers = indices(initial);
        DMatrixRMaj e = DMatrixRMaj.wrap(3, 3, p.essentialFromFundamental(fundamental));
        if (inliers.length < 6 || !essentialDecomposition.decompose(e)) {
            return Optional.empty();
        }
        double[][] pose = bestByCheirality(p, inliers, essentialDecomposition.getSolutions());
        double[] state = EpipolarPoseProblem.state(pose[0], pose[1]);
        double[] f = fundamental;
        for (double widen : CUT_SCHEDULE) {
            EpipolarPoseProblem problem = new EpipolarPoseProblem(p, inliers);
            state = LevenbergMarquardt.minimize(problem, state, config.refineIterations()).state();
            f = problem.fundamental(state);
            double cut = widen * config.inlierThresholdPx();
            boolean[] mask = new boolean[p.count];
            AdaptiveRansac.classify(p.count, f, p::epipolarSq, cut * cut, mask);
            inliers = indices(mask);
        }
        return Optional.of(new Refined(state, inliers, f));
    }

    /**
     * From a homography fit of a planar scene (undistorted pixels). The decomposition gives up to four poses; the
     * plane must lie in front of the first camera along every inlier's ray ({@code n . x_a > 0}, the visibility
     * constraint of Malis and Vargas, INRIA RR-6303, 2007), which leaves two in general (Faugeras and Lustman
     * 1988). Each of those is refined on the plane's inliers and scored by its MSAC epipolar cost over ALL
     * putative matches, so matches off the plane decide between them; the lowest cost wins. The earlier rule, the
     * cheirality count with a parallax threshold, leaned towards the wrong pose under forward motion, where points
     * near the focus of expansion have too little parallax to count (measured on the invented yard: 6-9 degree
     * pitch errors on short forward moves, docs/VERIFICATION.md). Costs within {@link #PLANE_TIE} of each other
     * leave the pair flagged ambiguous.
     */
    Recovered fromPlane(PointPairs p, AdaptiveRansac.Fit fit) {
        int[] inliers = indices(fit.inliers());
        double[] hn = Mat3.mul(p.kInverse, Mat3.mul(fit.model(), p.k));
        homographyDecomposition.decompose(DMatrixRMaj.wrap(3, 3, hn));
        List<Se3_F64> solutions = homographyDecomposition.getSolutionsSE();
        List<Vector3D_F64> normals = homographyDecomposition.getSolutionsN();
        double[] costs = new double[solutions.size()];
        double[][] states = new double[solutions.size()][];
        int best = -1;
        for (int s = 0; s < solutions.size(); s++) {
            costs[s] = Double.POSITIVE_INFINITY;
            if (!planeVisible(p, inliers, normals.get(s))) {
                continue;
            }
            Se3_F64 se = solutions.get(s);
            EpipolarPoseProblem problem = new EpipolarPoseProblem(p, inliers);
            states[s] = LevenbergMarquardt.minimize(problem, EpipolarPoseProblem.state(se.R.data.clone(), vec(se.T)),
                    config.refineIterations()).state();
            costs[s] = epipolarCost(p, problem.fundamental(states[s]));
            best = best < 0 || costs[s] < costs[best] ? s : best;
        }
        if (best < 0) {
            return new Recovered(Outcome.POINTS_BEHIND_CAMERA, inliers, Optional.empty(), ResidualStats.none());
        }
        boolean ambiguous = false;
        for (int s = 0; s < solutions.size(); s++) {
            ambiguous |= s != best && costs[s] <= (1 + PLANE_TIE) * costs[best]
                    && differentPose(solutions.get(s), solutions.get(best));
        }
        return finish(p, inliers, states[best], ambiguous);
    }

    /** True when at least {@link #VISIBLE_SHARE} of the inliers' rays in the first camera meet the plane in front. */
    private static boolean planeVisible(PointPairs p, int[] inliers, Vector3D_F64 normal) {
        int visible = 0;
        for (int i : inliers) {
            double[] ray = p.rayA(i);
            visible += normal.x * ray[0] + normal.y * ray[1] + normal.z * ray[2] > 0 ? 1 : 0;
        }
        return visible >= VISIBLE_SHARE * inliers.length;
    }

    /** MSAC epipolar cost of a pixel fundamental matrix over all matches, cut at the inlier threshold. */
    private double epipolarCost(PointPairs p, double[] fundamental) {
        double cutSq = config.inlierThresholdPx() * config.inlierThresholdPx();
        double cost = 0;
        for (int i = 0; i < p.count; i++) {
            cost += Math.min(p.epipolarSq(fundamental, i), cutSq);
        }
        return cost;
    }

    /** Drops inliers behind a camera, refits on the rest and builds the pose with its information. */
    private Recovered finish(PointPairs p, int[] inliers, double[] refined, boolean ambiguous) {
        double minSin = Cheirality.minSinParallax(p, config);
        double[] state = resolveCheirality(p, inliers, refined);
        double[] r = EpipolarPoseProblem.rotation(state);
        double[] t = EpipolarPoseProblem.translation(state);
        int kept = 0;
        int[] front = new int[inliers.length];
        for (int i : inliers) {
            if (Cheirality.side(r, t, p.rayA(i), p.rayB(i), minSin) != Cheirality.BEHIND) {
                front[kept++] = i;
            }
        }
        front = Arrays.copyOf(front, kept);
        if (kept < config.minInliers()) {
            Outcome why = inliers.length >= config.minInliers() ? Outcome.POINTS_BEHIND_CAMERA
                    : Outcome.TOO_FEW_INLIERS;
            return new Recovered(why, front, Optional.empty(), ResidualStats.none());
        }
        EpipolarPoseProblem problem = new EpipolarPoseProblem(p, front);
        LevenbergMarquardt.Solution sol = LevenbergMarquardt.minimize(problem, state, config.refineIterations());
        double[] rotation = EpipolarPoseProblem.rotation(sol.state());
        double[] direction = EpipolarPoseProblem.translation(sol.state());
        double[] info = InformationMatrix.ofEpipolarPose(sol.jacobian(), sol.residuals(), direction);
        RelativePose pose = new RelativePose(rotation, Optional.of(direction), Optional.empty(), info, ambiguous);
        return new Recovered(Outcome.ACCEPTED, front, Optional.of(pose),
                ResidualStats.of(sol.residuals(), sol.residuals().length));
    }

    /**
     * The Sampson cost cannot tell the four poses of one essential matrix apart (t and -t, and the twisted pair),
     * so on a flat cost valley the refinement may drift to one that puts the points behind the cameras. The
     * refined E is therefore decomposed again and the pose chosen by cheirality once more.
     */
    private double[] resolveCheirality(PointPairs p, int[] inliers, double[] state) {
        double[] e = Mat3.mul(Mat3.skew(EpipolarPoseProblem.translation(state)), EpipolarPoseProblem.rotation(state));
        if (!essentialDecomposition.decompose(DMatrixRMaj.wrap(3, 3, e))) {
            return state;
        }
        double[][] pose = bestByCheirality(p, inliers, essentialDecomposition.getSolutions());
        return EpipolarPoseProblem.state(pose[0], pose[1]);
    }

    /** The pose (R, t) of the decomposition with the largest front-minus-behind count. */
    private double[][] bestByCheirality(PointPairs p, int[] inliers, List<Se3_F64> solutions) {
        double minSin = Cheirality.minSinParallax(p, config);
        int bestNet = Integer.MIN_VALUE;
        double[][] best = null;
        for (Se3_F64 se : solutions) {
            int net = Cheirality.net(p, inliers, inliers.length, se.R.data, vec(se.T), minSin);
            if (net > bestNet) {
                bestNet = net;
                best = new double[][]{se.R.data.clone(), vec(se.T)};
            }
        }
        return best;
    }

    private static boolean differentPose(Se3_F64 a, Se3_F64 b) {
        double[] rel = Mat3.mul(a.R.data, Mat3.transpose(b.R.data));
        double cos = Mat3.dot(Mat3.unit(vec(a.T)), Mat3.unit(vec(b.T)));
        return Mat3.angle(rel) > Math.toRadians(1) || cos < Math.cos(Math.toRadians(5));
    }

    private static double[] vec(Vector3D_F64 v) {
        return new double[]{v.x, v.y, v.z};
    }

    static int[] indices(boolean[] mask) {
        int n = 0;
        int[] idx = new int[mask.length];
        for (int i = 0; i < mask.length; i++) {
            if (mask[i]) {
                idx[n++] = i;
            }
        }
        return Arrays.copyOf(idx, n);
    }
}
