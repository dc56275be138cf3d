namespace Phaseward.Analyzers.Elaboration;

/// <summary>A storage cell: a local, a parameter, a field of the design. Shared by reference for ref/out arguments.</summary>
internal sealed class Variable
{
    private object? value;

    public Variable(object? value)
        : this(value, SkippedWrites.Now)
    {
    }

    private Variable(object? value, long written)
    {
        this.value = value;
        Written = written;
    }

    public object? Value
    {
        get => value;
        set
        {
            this.value = value;
            Written = SkippedWrites.Now;
        }
    }

    /// <summary>When the value was last written, on <see cref="SkippedWrites"/>' clock: a write the elaborator skipped
    /// later than this may have changed it.</summary>
    public long Written { get; private set; }

    /// <summary>Marks the value as older than every skipped write: it reads as unknown if one may have reached it.</summary>
    public void MarkStale() => Written = 0;

    /// <summary>Another cell holding the same value, written when this one was (a struct's field copied with it).</summary>
    public Variable Copy() => new(value, Written);
}
