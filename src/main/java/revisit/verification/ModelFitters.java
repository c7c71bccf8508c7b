package revisit.verification;

import boofcv.abst.geo.EstimateNofEpipolar;
import boofcv.alg.geo.f.FundamentalLinear8;
import boofcv.alg.geo.h.HomographyDirectLinearTransform;
import boofcv.factory.geo.EnumFundamental;
import boofcv.factory.geo.FactoryMultiView;
import boofcv.struct.geo.AssociatedPair;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.ejml.data.DMatrixRMaj;
import org.ddogleg.struct.DogArray;

/**
 * Minimal and least-squares solvers (BoofCV 1.1.7's, and our five-point {@link FivePointEssential}) wrapped as
 * RANSAC samplers and refitters. All models are returned in undistorted pixel coordinates so one residual serves
 * each kind: the essential matrix from Nister's five-point method (IEEE PAMI 2004) is turned into
 * {@code F = K^-T E K^-1}. Holds solver state: one instance per thread.
 */
final class ModelFitters {

    /** Sample costs in Sampson residual evaluations (t_M of the SPRT), measured: see docs/VERIFICATION.md. */
    private static final double ESSENTIAL_SAMPLE_COST = 2000;
    private static final double FUNDAMENTAL_SAMPLE_COST = 1000;
    private static final double HOMOGRAPHY_SAMPLE_COST = 500;

    /** Our own solver: BoofCV's NISTER_5 runs interpreted (see FivePointEssential), ~100 us per sample. */
    private final FivePointEssential essentialFive = new FivePointEssential();
    private final List<double[]> essentials = new ArrayList<>();
    private final double[] sampleXa = new double[5];
    private final double[] sampleYa = new double[5];
    private final double[] sampleXb = new double[5];
    private final double[] sampleYb = new double[5];
    private final EstimateNofEpipolar fundamentalSeven = FactoryMultiView.fundamental_N(EnumFundamental.LINEAR_7);
    private final EstimateNofEpipolar fundamentalEight = FactoryMultiView.fundamental_N(EnumFundamental.LINEAR_8);
    private final FundamentalLinear8 essentialLinear = new FundamentalLinear8(false);
    private final FundamentalLinear8 fundamentalLinear = new FundamentalLinear8(true);
    private final HomographyDirectLinearTransform homographyLinear = new HomographyDirectLinearTransform(true);
    private final DogArray<DMatrixRMaj> solutions = new DogArray<>(() -> new DMatrixRMaj(3, 3));
    private final DMatrixRMaj single = new DMatrixRMaj(3, 3);
    private final List<AssociatedPair> subset = new ArrayList<>();

    /** Five-point essential samples in normalised coordinates, returned as pixel fundamental matrices. */
    AdaptiveRansac.Sampler essential(PointPairs p) {
        return sampler(5, ESSENTIAL_SAMPLE_COST, (idx, size, out) -> {
            for (int i = 0; i < 5; i++) {
                AssociatedPair q = p.normalized.get(idx[i]);
                sampleXa[i] = q.p1.x;
                sampleYa[i] = q.p1.y;
                sampleXb[i] = q.p2.x;
                sampleYb[i] = q.p2.y;
            }
            essentials.clear();
            essentialFive.solve(sampleXa, sampleYa, sampleXb, sampleYb, essentials);
            for (double[] e : essentials) {
                out.add(p.fundamentalFromEssential(e));
            }
        });
    }

    /** Seven- or eight-point fundamental samples in pixels. */
    AdaptiveRansac.Sampler fundamental(PointPairs p, VerificationConfig.FundamentalSolver solver) {
        boolean seven = solver == VerificationConfig.FundamentalSolver.SEVEN_POINT;
        EstimateNofEpipolar alg = seven ? fundamentalSeven : fundamentalEight;
        return sampler(seven ? 7 : 8, FUNDAMENTAL_SAMPLE_COST, (idx, size, out) -> {
            if (alg.process(gather(p.pixels, idx, size), solutions)) {
                for (int i = 0; i < solutions.size; i++) {
                    out.add(solutions.get(i).data.clone());
                }
            }
        });
    }

    /** Four-point homography samples in pixels (normalised DLT, H&amp;Z algorithm 4.2). */
    AdaptiveRansac.Sampler homography(PointPairs p) {
        return sampler(4, HOMOGRAPHY_SAMPLE_COST, (idx, size, out) -> dlt(p, idx, size).ifPresent(out::add));
    }

    /** Linear eight-point essential matrix on all inliers (singular values forced equal), in pixels. */
    AdaptiveRansac.Refitter essentialRefit(PointPairs p) {
        return (current, idx, size) -> size >= 8 && essentialLinear.process(gather(p.normalized, idx, size), single)
                ? Optional.of(p.fundamentalFromEssential(single.data.clone())) : Optional.empty();
    }

    /** Normalised eight-point fundamental matrix on all inliers (Hartley, IEEE PAMI 1997). */
    AdaptiveRansac.Refitter fundamentalRefit(PointPairs p) {
        return (current, idx, size) -> size >= 8 && fundamentalLinear.process(gather(p.pixels, idx, size), single)
                ? Optional.of(single.data.clone()) : Optional.empty();
    }

    /** Normalised DLT homography on all given points. */
    AdaptiveRansac.Refitter homographyRefit(PointPairs p) {
        return (current, idx, size) -> dlt(p, idx, size);
    }

    private Optional<double[]> dlt(PointPairs p, int[] idx, int size) {
        return size >= 4 && homographyLinear.process(gather(p.pixels, idx, size), single) && isFinite(single.data)
                ? Optional.of(single.data.clone()) : Optional.empty();
    }

    private List<AssociatedPair> gather(List<AssociatedPair> all, int[] idx, int size) {
        subset.clear();
        for (int i = 0; i < size; i++) {
            subset.add(all.get(idx[i]));
        }
        return subset;
    }

    private static boolean isFinite(double[] m) {
        for (double v : m) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }

    private interface Fit {
        void fit(int[] indices, int size, List<double[]> out);
    }

    private static AdaptiveRansac.Sampler sampler(int size, double cost, Fit fit) {
        return new AdaptiveRansac.Sampler() {
            @Override
            public int sampleSize() {
                return size;
            }

            @Override
            public double sampleCost() {
                return cost;
            }

            @Override
            public void fit(int[] indices, int n, List<double[]> out) {
                fit.fit(indices, n, out);
            }
        };
    }
}
