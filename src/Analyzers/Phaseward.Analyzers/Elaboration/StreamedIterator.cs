namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// What a call of the design's iterator gives when a foreach consumed its values as they were yielded (the loop body
/// ran at each 'yield return'): there is no collection left to enumerate.
/// </summary>
internal sealed class StreamedIterator
{
    public static readonly StreamedIterator Value = new();

    private StreamedIterator()
    {
    }
}
