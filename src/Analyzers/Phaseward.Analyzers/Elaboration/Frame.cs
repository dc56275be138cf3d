using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace Phaseward.Analyzers.Elaboration;

/// <summary>
/// The variables of one interpreted call. A local function's frame points at the frame of the method that declares it
/// (its lexical parent), so that it sees the locals it captures.
/// </summary>
internal sealed class Frame
{
    private readonly Dictionary<ISymbol, Variable> variables;

    /// <param name="capacity">How many variables the frame is expected to hold (it grows beyond if need be).</param>
    public Frame(IMethodSymbol? method, Frame? lexicalParent, InterpretedObject? instance, int capacity = 0)
    {
        variables = new Dictionary<ISymbol, Variable>(capacity, SymbolEqualityComparer.Default);
        Method = method;
        LexicalParent = lexicalParent;
        Instance = instance;
    }

    public IMethodSymbol? Method { get; }

    public Frame? LexicalParent { get; }

    /// <summary>The design object <c>this</c> refers to (null in static code).</summary>
    public InterpretedObject? Instance { get; }

    /// <summary>How many variables the frame holds.</summary>
    public int Count => variables.Count;

    /// <summary>Set by <c>return</c>.</summary>
    public object? ReturnValue { get; set; }

    /// <summary>The type arguments of the generic method or type this frame runs, by type parameter (null when none).</summary>
    public Dictionary<ITypeParameterSymbol, ITypeSymbol>? TypeArguments { get; set; }

    /// <summary>
    /// What a type parameter stands for here: from this frame's or an enclosing frame's type arguments, or from the
    /// constructed type of the object the code runs on. Null when it is not known.
    /// </summary>
    public ITypeSymbol? TypeArgumentOf(ITypeParameterSymbol parameter)
    {
        var definition = (ITypeParameterSymbol)parameter.OriginalDefinition;
        for (var frame = this; frame is not null; frame = frame.LexicalParent)
        {
            if (frame.TypeArguments is { } arguments && arguments.TryGetValue(definition, out var argument))
                return argument;
            if (definition.TypeParameterKind == TypeParameterKind.Type && frame.Instance?.Type is { } type)
                for (var current = type; current is not null; current = current.BaseType)
                    if (SymbolEqualityComparer.Default.Equals(current.OriginalDefinition, definition.DeclaringType?.OriginalDefinition)
                        && definition.Ordinal < current.TypeArguments.Length && current.TypeArguments[definition.Ordinal] is not ITypeParameterSymbol)
                        return current.TypeArguments[definition.Ordinal];
        }

        return null;
    }

    /// <summary>
    /// Where an iterator run by a foreach hands each yielded value (the loop body); false back means the loop stopped
    /// (break or return), so the iterator stops too. Null when the iterator collects its values (<see cref="Yielded"/>).
    /// </summary>
    public System.Func<object?, bool>? Consumer { get; set; }

    /// <summary>What an iterator method has yielded so far (null when the method is not an iterator).</summary>
    public List<object?>? Yielded { get; set; }

    public void Declare(ISymbol symbol, object? value) => variables[symbol] = new Variable(value);

    public void Bind(ISymbol symbol, Variable variable) => variables[symbol] = variable;

    /// <summary>Is the local or parameter this frame's own (not one it captures from an enclosing method)?</summary>
    public bool Declares(ISymbol symbol) => variables.ContainsKey(symbol);

    /// <summary>Finds a local or parameter here or in an enclosing method's frame (captured variables).</summary>
    public Variable? Find(ISymbol symbol)
    {
        for (var frame = this; frame is not null; frame = frame.LexicalParent)
            if (frame.variables.TryGetValue(symbol, out var variable))
                return variable;
        return null;
    }

    /// <summary>The frame (this one or a lexical parent) that runs <paramref name="method"/>.</summary>
    public Frame? FrameOf(IMethodSymbol method)
    {
        for (var frame = this; frame is not null; frame = frame.LexicalParent)
            if (frame.Method is not null && SymbolEqualityComparer.Default.Equals(frame.Method.OriginalDefinition, method.OriginalDefinition))
                return frame;
        return null;
    }
}
