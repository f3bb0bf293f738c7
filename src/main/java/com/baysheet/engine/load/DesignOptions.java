package com.baysheet.engine.load;

/**
 * Project options that change the calculation.
 *
 * @param partitionAllowance add the partition allowance of ASCE 7-16 4.3.2 on floors whose L0 the edition does not
 *                           exempt (below 80 psf in 7-16; up to 80 psf in 7-10)
 * @param reducePartitions   reduce the partition allowance with the live load (disputed in practice; default no)
 * @param upliftReducedDead  also take the minimum reactions of overhanging beams from 0.9D + 1.6L (+ 0.5Lr): no
 *                           2.3.1 combination, a conservative practice of some firms; default no
 */
public record DesignOptions(boolean partitionAllowance, boolean reducePartitions, boolean upliftReducedDead) {
    public static final DesignOptions DEFAULT = new DesignOptions(false, false, false);

    /** The partition options alone, the uplift option off. */
    public DesignOptions(boolean partitionAllowance, boolean reducePartitions) {
        this(partitionAllowance, reducePartitions, false);
    }
}
