namespace Phaseward
{
    /// <summary>
    /// Titles and message formats as constants, so that the analyzers' descriptors are built from compile-time constants
    /// (the release-tracking analyzer reads them) and both front ends print the same words.
    /// </summary>
    public static class RuleTexts
    {
        public const string DesignFoundTitle = "Phaseward checked a design";
        public const string DesignFoundMessage = "Phaseward checked design '{0}'";
        public const string DesignFoundDescription = "Reported once per design class to show that the Phaseward analyzers are loaded into the build.";

        public const string SeriesPassGatesTitle = "Pass gates in series without a restoring stage";
        public const string SeriesPassGatesMessage =
            "{0} pass gates in series without a restoring stage (limit {1}): Elmore delay {2} (50% estimate {3}); a restoring stage every {4} gates would give about {5}";
        public const string SeriesPassGatesDescription =
            "A chain of pass gates with no restoring stage is an RC ladder: its delay grows with the square of its length and its edges slow down. "
            + "The rule reports a chain longer than phaseward.max_series_pass_gates (default: the optimum restoring-stage spacing of the design's process, at least 2) "
            + "at its first gate beyond the limit. Figures are first-order estimates.";
        public const string DynamicNodeOnGatedClockTitle = "Dynamic node on a clock that can be gated off";
        public const string DynamicNodeOnGatedClockMessage =
            "Dynamic node '{0}' floats while gated clock '{1}' is stopped {2} (declared maximum idle time: {3}), but keeps its level only {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7})";
        public const string DynamicNodeOnGatedClockDescription =
            "A node driven only through pass devices, with no keeper or restoring feedback, holds its bit as charge. When its clock gate stops the clock at a level that turns every driver off, leakage drains the node for as long as the clock stays off; if the gate declares no maximum idle time, or one longer than the node's retention time C·ΔV/I_leak, the bit can be lost. First-order, linear estimate.";

        public const string ClockTooSlowForDynamicStorageTitle = "Clock too slow for dynamic storage";
        public const string ClockTooSlowForDynamicStorageMessage =
            "Dynamic node '{0}' floats for up to {1} of every {2} period of clock '{3}', longer than its retention time {4} (C·ΔV/I_leak with C = {5}, ΔV = {6}, I_leak = {7}); run the clock at {8} or faster";
        public const string ClockTooSlowForDynamicStorageDescription =
            "A dynamic node is refreshed only while one of its pass devices conducts. With the clock running, the longest stretch of each period in which all of them are off (from the period, duty and complement skew) must be shorter than the node's retention time C·ΔV/I_leak. First-order, linear estimate.";

        public const string ChargeSharingTitle = "Charge sharing corrupts a dynamic node";
        public const string ChargeSharingMessage =
            "When '{0}' conducts, floating node '{1}' (C1 = {2}) shares its charge with floating node '{3}' (C2 = {4}): a {5} level settles at {6}, a droop of {7}, more than the tolerated {8}";
        public const string ChargeSharingDescription =
            "A pass device that opens between a charged floating node and another floating node shares the charge between them: the level settles at V·C1/(C1+C2), a droop of V·C2/(C1+C2) in the worst case (the other node at the opposite level). First-order estimate by conservation of charge.";
    }
}
