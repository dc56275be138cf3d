namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// How much work the elaborator may do for one design. One step is one loop iteration or one call (a method, local
/// function, operator or constructor of the design's code, the DSL or System.Math, or a property getter written in the
/// design's code); reading a DSL property and straight-line code between calls are free, because they are bounded by
/// the length of the source.
/// </summary>
internal readonly struct ElaborationLimits : System.IEquatable<ElaborationLimits>
{
    /// <summary>
    /// Default step budget. A loop that makes one device per iteration through a helper method costs three steps per
    /// device (iteration, helper call, DSL call), so 1,000,000 such devices take 3,000,000 steps; an endless loop
    /// stops after 10,000,000 steps (about a second of interpretation).
    /// </summary>
    public const long DefaultStepBudget = 10_000_000;

    /// <summary>
    /// Default cap on the devices (primitives) one design may elaborate to. Steps bound the interpretation, but a runaway
    /// loop that makes devices costs far more per step (each device is kept, with its source span): this cap stops it
    /// before it takes the compiler's memory and minutes of time. Twice the largest design the benchmark measures.
    /// </summary>
    public const int DefaultDeviceBudget = 2_000_000;

    /// <summary>Default limit on nested calls of interpreted methods (recursion depth).</summary>
    public const int DefaultRecursionLimit = 64;

    /// <summary>The largest recursion limit accepted: deeper nesting would risk the compiler's own stack.</summary>
    public const int MaxRecursionLimit = 512;

    /// <summary>
    /// Default memory budget in bytes for what the design's own code allocates at compile time (arrays at 8 bytes an
    /// element, strings at 2 bytes a character, collections at 8 bytes an item; the netlist itself is bounded by the
    /// device budget). 256 MiB: far above any design's tables of nets and names, far below what would strain an editor.
    /// </summary>
    public const long DefaultMemoryBudget = 256L * 1024 * 1024;

    /// <summary>The largest memory budget accepted (4 GiB): a larger one would let a design take the editor's memory.</summary>
    public const long MaxMemoryBudget = 4L * 1024 * 1024 * 1024;

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
