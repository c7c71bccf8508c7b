package revisit.pipeline;

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
 * @param scan         the scan itself
 */
public record ScanConfig(FeatureConfig features, IndexConfig index, VerificationConfig verification,
                         ScanSettings scan) {

    public ScanConfig {
        if (features == null || index == null || verification == null || scan == null) {
            throw new IllegalArgumentException("every section of the scan configuration must be given");
        }
    }

    /** All defaults. */
    public static ScanConfig defaults() {
        return new ScanConfig(FeatureConfig.defaults(), IndexConfig.defaults(), VerificationConfig.defaults(),
                ScanSettings.defaults());
    }

    public ScanConfig withFeatures(FeatureConfig v) {
        return new ScanConfig(v, index, verification, scan);
    }

    public ScanConfig withIndex(IndexConfig v) {
        return new ScanConfig(features, v, verification, scan);
    }

    public ScanConfig withVerification(VerificationConfig v) {
        return new ScanConfig(features, index, v, scan);
    }

    public ScanConfig withScan(ScanSettings v) {
        return new ScanConfig(features, index, verification, v);
    }
}
