using Phaseward.Configuration;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// How much work the elaborator may do for one design. One step is one loop iteration or one call (a method, local
/// function, operator or constructor of the design's code, the DSL or System.Math, or a property getter written in the
/// design's code); reading a DSL property and straight-line code between calls are free, because they are bounded by
/// the length of the source.
/// </summary>
internal readonly struct ElaborationLimits : System.IEquatable<ElaborationLimits>
{
    // The defaults and bounds are those of the phaseward.elaboration_* options (OptionCatalog, with their reasons).
    public const long DefaultStepBudget = OptionCatalog.DefaultStepBudget;
    public const int DefaultDeviceBudget = OptionCatalog.DefaultDeviceBudget;
    public const int DefaultRecursionLimit = OptionCatalog.DefaultRecursionLimit;
    public const int MaxRecursionLimit = OptionCatalog.MaxRecursionLimit;
    public const long DefaultMemoryBudget = OptionCatalog.DefaultMemoryBudget;
    public const long MaxMemoryBudget = OptionCatalog.MaxMemoryBudget;

    public ElaborationLimits(long stepBudget, int recursionLimit, long deviceBudget = DefaultDeviceBudget, long memoryBudget = DefaultMemoryBudget)
    {
        StepBudget = stepBudget;
        RecursionLimit = recursionLimit;
        DeviceBudget = deviceBudget;
        MemoryBudget = memoryBudget;
    }

    public static ElaborationLimits Default { get; } = new(DefaultStepBudget, DefaultRecursionLimit, DefaultDeviceBudget, DefaultMemoryBudget);

    /// <summary>The most bytes the design's code may allocate (see <see cref="DefaultMemoryBudget"/>).</summary>
    public long MemoryBudget { get; }

    public long StepBudget { get; }

    public int RecursionLimit { get; }

    /// <summary>The most devices (and, separately, nets) one design may elaborate to.</summary>
    public long DeviceBudget { get; }

    public bool Equals(ElaborationLimits other) => StepBudget == other.StepBudget && RecursionLimit == other.RecursionLimit && DeviceBudget == other.DeviceBudget
        && MemoryBudget == other.MemoryBudget;

    public override bool Equals(object? obj) => obj is ElaborationLimits other && Equals(other);

    public override int GetHashCode() => ((StepBudget.GetHashCode() * 31 + RecursionLimit) * 31 + DeviceBudget.GetHashCode()) * 31 + MemoryBudget.GetHashCode();
}
