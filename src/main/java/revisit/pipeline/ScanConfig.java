package revisit.pipeline;

import revisit.consistency.ConsistencyConfig;
import revisit.features.FeatureConfig;
import revisit.index.IndexConfig;
import revisit.verification.VerificationConfig;

/**
 * Every setting of a scan; read from and written to the configuration file (docs/FORMAT-config.md) that
 * {@code scan} reads and {@code tune} writes.
 *
 * @param features     feature extraction
 * @param index        revisit database and candidate selection
 * @param verification geometric verification
 * @param consistency  closure-versus-closure checks before export
 * @param scan         the scan itself
 */
public record ScanConfig(FeatureConfig features, IndexConfig index, VerificationConfig verification,
                         ConsistencyConfig consistency, ScanSettings scan) {

    public ScanConfig {
        if (features == null || index == null || verification == null || consistency == null || scan == null) {
            throw new IllegalArgumentException("every section of the scan configuration must be given");
        }
    }

    /** All defaults. */
    public static ScanConfig defaults() {
        return new ScanConfig(FeatureConfig.defaults(), IndexConfig.defaults(), VerificationConfig.defaults(),
                ConsistencyConfig.defaults(), ScanSettings.defaults());
    }

    public ScanConfig withFeatures(FeatureConfig v) {
        return new ScanConfig(v, index, verification, consistency, scan);
    }

    public ScanConfig withIndex(IndexConfig v) {
        return new ScanConfig(features, v, verification, consistency, scan);
    }

    public ScanConfig withVerification(VerificationConfig v) {
        return new ScanConfig(features, index, v, consistency, scan);
    }

    public ScanConfig withConsistency(ConsistencyConfig v) {
        return new ScanConfig(features, index, verification, v, scan);
    }

    public ScanConfig withScan(ScanSettings v) {
        return new ScanConfig(features, index, verification, consistency, v);
    }
}
