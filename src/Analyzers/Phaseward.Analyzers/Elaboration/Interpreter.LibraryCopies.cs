using System.Collections;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Struct values the library moves between storage places. C# copies a struct each time it moves: passed by value to
// List.Add, put in a new array by ToArray, CopyTo, Clone, Resize or Fill. The library, run natively, moves the
// interpreter's object references instead, so each place a library call fills gets copies of its own. Where the
// static type is a reference type (object, an interface) the element is a box, and boxes stay shared.
internal sealed partial class Interpreter
{
    /// <summary>A value as stored in a place of the given static type: a struct (or a tuple holding one) copied.</summary>
    private object? OwnCopy(object? value, ITypeSymbol? storedAs)
    {
        switch (value)
        {
            case InterpretedObject { Type.IsValueType: true } structValue when storedAs?.IsReferenceType != true:
                return structValue.Copy();
            case TupleValue tuple when storedAs is INamedTypeSymbol { IsTupleType: true, TupleElements: var elements } && elements.Length == tuple.Items.Length:
                var items = new object?[tuple.Items.Length];
                var copied = false;
                for (var i = 0; i < items.Length; i++)
                    copied |= !ReferenceEquals(items[i] = OwnCopy(tuple.Items[i], elements[i].Type), tuple.Items[i]);
                return copied ? new TupleValue(items) : tuple;
            default:
                return value;
        }
    }

    /// <summary>Whether elements of this static type may be structs of the design (else there is nothing to copy).</summary>
    private bool MayHoldStructs(ITypeSymbol? element)
        => element is ITypeParameterSymbol || element is { IsTupleType: true } || element is { IsValueType: true } && session.IsInSource(element);

    /// <summary>Gives each slot of an array or list its own copy of the structs it holds.</summary>
    private void OwnElements(object? collection, ITypeSymbol? staticType)
    {
        var element = staticType is null ? null : ElementTypeOf(staticType);
        if (!MayHoldStructs(element) || collection is not (object?[] or List<object?>))
            return;
        var slots = (IList)collection;
        for (var i = 0; i < slots.Count; i++)
            slots[i] = OwnCopy(slots[i], element);
    }

    /// <summary>
    /// A new set, dictionary, queue or stack a call made (held with erased type arguments): refilled, in its order, with
    /// copies of the structs it holds. False for other kinds of collection.
    /// </summary>
    private bool OwnCollectionElements(object? collection, ITypeSymbol? staticType)
    {
        var arguments = (staticType as INamedTypeSymbol)?.TypeArguments ?? ImmutableArray<ITypeSymbol>.Empty;
        var first = arguments.Length > 0 ? arguments[0] : null;
        var second = arguments.Length > 1 ? arguments[1] : null;
        if (!MayHoldStructs(first) && !MayHoldStructs(second))
            return collection is HashSet<object?> or SortedSet<object?> or Dictionary<object, object?> or SortedDictionary<object, object?> or Queue<object?> or Stack<object?>;
        switch (collection)
        {
            case HashSet<object?> or SortedSet<object?>:
                var set = (ISet<object?>)collection;
                var items = set.ToList();
                set.Clear();
                foreach (var item in items)
                    set.Add(OwnCopy(item, first));
                return true;
            case IDictionary<object, object?> map when collection is Dictionary<object, object?> or SortedDictionary<object, object?>:
                var pairs = map.ToList();
                map.Clear();
                foreach (var pair in pairs)
                    map.Add(OwnCopy(pair.Key, first)!, OwnCopy(pair.Value, second));
                return true;
            case Queue<object?> queue:
                var queued = queue.ToArray();
                queue.Clear();
                foreach (var item in queued)
                    queue.Enqueue(OwnCopy(item, first));
                return true;
            case Stack<object?> stack:
                var stacked = stack.ToArray();
                stack.Clear();
                for (var i = stacked.Length - 1; i >= 0; i--)
                    stack.Push(OwnCopy(stacked[i], first));
                return true;
            default:
                return false;
        }
    }

    /// <summary>
    /// After a library call: the collection it made (an array, list, set, dictionary, queue or stack; not one it was
    /// given), the receiver a call such as AddRange filled, and the arrays that CopyTo, Array.Copy, Fill or Resize wrote
    /// get their own struct copies; the arrays a collection of another kind (a lookup) was made from keep theirs instead.
    /// </summary>
    private void OwnLibraryCopies(IOperation site, IMethodSymbol method, object? receiver, object?[] given, object? result, ITypeSymbol? resultType, Frame? frame)
    {
        // Only collections count (a lazy sequence is not a place: what enumerates it stores the elements somewhere).
        // A getter or indexer gives what is stored (d.Values, grid[i]), not a new collection.
        var fresh = method.MethodKind != MethodKind.PropertyGet && (result is ICollection or ILookup<object, object?> || result?.GetType().Namespace == "System.Collections.Generic")
            && !ReferenceEquals(result, receiver) && !Holds(given, result);
        var writes = Mutators.Contains(method.Name) || method.ContainingType?.SpecialType == SpecialType.System_Array;
        if (!fresh && !writes)
            return; // most calls (a string's, a number's, Count, First): nothing stored anywhere
        var invocation = site as IInvocationOperation;
        var receiverType = invocation?.Instance?.Type;
        if (fresh && result is object?[] or List<object?>)
            OwnElements(result, resultType is not null && ElementTypeOf(resultType) is not null ? resultType : Resolved(receiverType, frame));
        if (writes && HasSequence(given))
            OwnElements(receiver, Resolved(receiverType, frame));
        if (!writes && (result is object?[] or List<object?> || OwnCollectionElements(result, resultType)))
            return;
        for (var i = 0; i < given.Length && i < method.Parameters.Length; i++)
            if (given[i] is object?[] array)
                OwnElements(array, Resolved(ArgumentType(invocation, i) ?? method.Parameters[i].Type, frame));
    }

    private static bool Holds(object?[] values, object? value)
    {
        foreach (var candidate in values)
            if (ReferenceEquals(candidate, value))
                return true;
        return false;
    }

    private static bool HasSequence(object?[] values)
    {
        foreach (var value in values)
            if (value is IEnumerable and not string)
                return true;
        return false;
    }

    // The static type of the argument given for a parameter (before its conversion to the parameter's type: Cnt[], not Array).
    private static ITypeSymbol? ArgumentType(IInvocationOperation? invocation, int ordinal)
        => invocation?.Arguments.FirstOrDefault(a => a.Parameter?.Ordinal == ordinal) is { } argument ? StripConversions(argument.Value).Type : null;
}
