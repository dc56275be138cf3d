using Phaseward.Internal;

namespace Phaseward
{
    /// <summary>
    /// Lint policy: thresholds that are a team's choice rather than a property of the design. The analyzers read it
    /// from <c>.editorconfig</c> keys prefixed <c>phaseward.</c>; at run time pass one to <see cref="Design.Check"/>.
    /// </summary>
    public sealed class RulePolicy
    {
        private readonly Time minimumRaceMargin = Time.Zero;
        private readonly Time minimumTimingSlack = Time.Zero;

        public static RulePolicy Default { get; } = new();

        /// <summary>
        /// PW1002 reports a latch pair whose overlap race margin is below this (default 0: only negative margins).
        /// Key <c>phaseward.min_race_margin</c>. Zero or positive.
        /// </summary>
        public Time MinimumRaceMargin
        {
            get => minimumRaceMargin;
            init => minimumRaceMargin = new Time(Guard.NonNegative(value.Seconds, nameof(MinimumRaceMargin), "s"));
        }

        /// <summary>
        /// PW4001, PW4002 and PW4003 report a path whose slack is below this (default 0: only negative slack).
        /// Key <c>phaseward.min_timing_slack</c>. Zero or positive.
        /// </summary>
        public Time MinimumTimingSlack
        {
            get => minimumTimingSlack;
            init => minimumTimingSlack = new Time(Guard.NonNegative(value.Seconds, nameof(MinimumTimingSlack), "s"));
        }
    }
}
