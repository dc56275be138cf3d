using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Object creation, arrays, List<T>, tuples. Arrays are object?[] and lists List<object?> whatever their element type,
// so they can hold Unknown elements; they become typed .NET collections only when passed to the DSL.
internal sealed partial class Interpreter
{
    private object? Create(IObjectCreationOperation creation, Frame frame)
    {
        var type = creation.Type as INamedTypeSymbol;
        if (type is not null && IsList(type))
        {
            Step(creation);
            var list = new List<object?>();
            if (creation.Arguments.Length == 1 && creation.Arguments[0].Value.Type?.SpecialType != SpecialType.System_Int32)
            {
                var source = Evaluate(creation.Arguments[0].Value, frame);
                if (Unknown.Is(source)) return source;
                if (source is object?[] items) list.AddRange(items);
                else if (source is List<object?> other) list.AddRange(other);
                else return Unsupported(creation, "this list", "it is copied from a collection the elaborator does not know");
            }

            return Initialize(creation, list, frame);
        }

        if (type is not null && session.IsInSource(type) && creation.Constructor is { } sourceConstructor)
            return CreateObject(creation, type, sourceConstructor, frame);

        if (type is null || !ClrTypes.IsDsl(type) || creation.Constructor is not { } constructor)
            return Unsupported(creation, "the creation of " + (type is null ? "this object" : Describe(type)),
                "only Phaseward DSL objects, arrays and List<T> are created at compile time");

        Step(creation);
        object? made;
        if (constructor.Parameters.Length == 0 && type.IsValueType)
        {
            made = ClrTypes.Resolve(type) is { } clr ? Activator.CreateInstance(clr) : null;
        }
        else
        {
            var (arguments, _) = Arguments(creation.Arguments, constructor, frame);
            if (arguments is null) return Unknown.Value;
            made = CallClr(creation, constructor, null, arguments);
        }

        if (made is null || Unknown.Is(made))
            return made ?? Unsupported(creation, "the creation of " + Describe(type), "the type was not found in the Phaseward assembly");
        return Initialize(creation, made, frame);
    }

    /// <summary>Runs an object or collection initializer (<c>{ P = v }</c>, <c>{ a, b }</c>) on a new object.</summary>
    private object? Initialize(IObjectCreationOperation creation, object made, Frame frame)
    {
        if (creation.Initializer is null)
            return made;
        implicitReceivers.Push(made);
        try
        {
            foreach (var initializer in creation.Initializer.Initializers)
            {
                var result = Evaluate(initializer, frame);
                if (Unknown.Is(result))
                    return result;
            }
        }
        finally
        {
            implicitReceivers.Pop();
        }

        return made;
    }

    private object? CreateArray(IArrayCreationOperation creation, Frame frame)
    {
        if (creation.DimensionSizes.Length != 1)
            return Unsupported(creation, "a multi-dimensional array", "only one-dimensional arrays are elaborated");
        var size = Evaluate(creation.DimensionSizes[0], frame);
        if (Unknown.Is(size)) return size;
        var length = System.Convert.ToInt32(size, CultureInfo.InvariantCulture);
        if (length < 0)
        {
            Throws(creation.Syntax, $"OverflowException: an array cannot have a negative length ({length})");
            return Unknown.Value;
        }

        Step(creation);
        var element = ((IArrayTypeSymbol)creation.Type!).ElementType;
        var items = new object?[length];
        var initial = DefaultOf(element);
        for (var i = 0; i < length; i++)
            items[i] = initial;
        if (creation.Initializer is { } initializer)
            for (var i = 0; i < initializer.ElementValues.Length && i < length; i++)
                items[i] = Evaluate(initializer.ElementValues[i], frame);
        return items;
    }

    private object? CreateCollection(ICollectionExpressionOperation collection, Frame frame)
    {
        var items = new List<object?>();
        foreach (var element in collection.Elements)
        {
            if (element is ISpreadOperation spread)
            {
                var source = Evaluate(spread.Operand, frame);
                if (Unknown.Is(source)) return source;
                if (source is object?[] array) items.AddRange(array);
                else if (source is List<object?> list) items.AddRange(list);
                else return Unsupported(spread, "this spread element", "only arrays and lists are spread");
                continue;
            }

            items.Add(Evaluate(element, frame));
        }

        Step(collection);
        return collection.Type switch
        {
            IArrayTypeSymbol => items.ToArray(),
            INamedTypeSymbol named when IsList(named) || IsListInterface(named) => items,
            _ => Unsupported(collection, "this collection expression", "only arrays and List<T> are built from collection expressions"),
        };
    }

    private object? CreateTuple(ITupleOperation tuple, Frame frame)
    {
        var items = new object?[tuple.Elements.Length];
        for (var i = 0; i < items.Length; i++)
            items[i] = Evaluate(tuple.Elements[i], frame);
        return new TupleValue(items);
    }

    private object? ListMethod(IInvocationOperation invocation, List<object?> list, Frame frame)
    {
        var method = invocation.TargetMethod;
        var (arguments, _) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        switch (method.Name)
        {
            case "Add" when arguments.Length == 1:
                list.Add(arguments[0]);
                return null;
            case "AddRange" when arguments.Length == 1 && arguments[0] is object?[] or List<object?>:
                list.AddRange(arguments[0] as IEnumerable<object?> ?? Array.Empty<object?>());
                return null;
            case "Insert" when arguments.Length == 2:
                var at = System.Convert.ToInt32(arguments[0], CultureInfo.InvariantCulture);
                if (at < 0 || at > list.Count) break;
                list.Insert(at, arguments[1]);
                return null;
            case "RemoveAt" when arguments.Length == 1:
                var index = System.Convert.ToInt32(arguments[0], CultureInfo.InvariantCulture);
                if (index < 0 || index >= list.Count) break;
                list.RemoveAt(index);
                return null;
            case "Clear" when arguments.Length == 0:
                list.Clear();
                return null;
            case "Contains" when arguments.Length == 1:
                return list.Any(item => Equal(item, arguments[0]) == true);
            case "IndexOf" when arguments.Length == 1:
                return list.FindIndex(item => Equal(item, arguments[0]) == true);
            case "ToArray" when arguments.Length == 0:
                return list.ToArray();
            default:
                return Unsupported(invocation, "the call to " + Describe(method), "the elaborator supports List<T>'s Add, AddRange, Insert, RemoveAt, Clear, Contains, IndexOf and ToArray");
        }

        Throws(invocation.Syntax, $"ArgumentOutOfRangeException: index {Arithmetic.Text(arguments[0])} is outside a list of {list.Count} elements");
        return Unknown.Value;
    }

    private static bool IsList(INamedTypeSymbol type) => ClrTypes.MetadataName(type.OriginalDefinition) == "System.Collections.Generic.List`1";

    private static bool IsListInterface(INamedTypeSymbol type) => ClrTypes.MetadataName(type.OriginalDefinition) is
        "System.Collections.Generic.IList`1" or "System.Collections.Generic.IReadOnlyList`1" or "System.Collections.Generic.IEnumerable`1"
        or "System.Collections.Generic.ICollection`1" or "System.Collections.Generic.IReadOnlyCollection`1";
}
