namespace Phaseward
{
    /// <summary>
    /// Lint policy: thresholds that are a team's choice rather than a property of the design. The analyzers read it
    /// from <c>.editorconfig</c> keys prefixed <c>phaseward.</c>; at run time pass one to <see cref="Design.Check"/>.
    /// </summary>
    public sealed class RulePolicy
    {
        public static RulePolicy Default { get; } = new();
    }
}
