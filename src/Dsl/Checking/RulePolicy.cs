using System;

namespace Phaseward
{
    /// <summary>
    /// Lint policy: thresholds that are a team's choice rather than a property of the design. The analyzers read it
    /// from <c>.editorconfig</c> keys prefixed <c>phaseward.</c>; at run time pass one to <see cref="Design.Check"/>.
    /// </summary>
    public sealed class RulePolicy
    {
        private readonly int? maxSeriesPassGates;

        public static RulePolicy Default { get; } = new();

        /// <summary>
        /// The most pass gates allowed in series without a restoring stage (PW2001; <c>phaseward.max_series_pass_gates</c>).
        /// Null: the optimum restoring-stage spacing computed from the design's process, but never below 2.
        /// </summary>
        public int? MaxSeriesPassGates
        {
            get => maxSeriesPassGates;
            init
            {
                if (value is < 1)
                    throw new ArgumentException($"'{nameof(MaxSeriesPassGates)}' must be at least 1 pass gate (was {value}).", nameof(MaxSeriesPassGates));
                maxSeriesPassGates = value;
            }
        }
    }
}
