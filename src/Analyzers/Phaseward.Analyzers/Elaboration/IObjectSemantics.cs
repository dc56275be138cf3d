namespace Phaseward.Analyzers.Elaboration;

/// <summary>What ToString, Equals, GetHashCode and CompareTo mean for an interpreted object (answered by the interpreter).</summary>
internal interface IObjectSemantics
{
    string TextOf(InterpretedObject value);

    bool AreEqual(InterpretedObject value, object? other);

    int HashOf(InterpretedObject value);

    int CompareOf(InterpretedObject value, object? other);
}
