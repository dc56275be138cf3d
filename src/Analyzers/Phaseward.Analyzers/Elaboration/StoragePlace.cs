using System;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>Somewhere a value can be stored: a variable, an array or list slot, a property of a DSL object.</summary>
internal readonly struct StoragePlace
{
    private readonly Func<object?> get;
    private readonly Action<object?> set;

    public StoragePlace(Func<object?> get, Action<object?> set)
    {
        this.get = get;
        this.set = set;
    }

    public bool IsKnown => get is not null;

    public object? Get() => get();

    public void Set(object? value) => set(value);
}
