using System.Runtime.CompilerServices;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// Arrays as .NET types them. The interpreter holds every array as object?[], so the element type it was made with is
// kept beside it: a string[] held as object[] refuses an int (ArrayTypeMismatchException, array covariance), answers
// 'is string[]' and casts as a string[] does, and an int[] is not an object[].
internal sealed partial class Interpreter
{
    /// <summary>
    /// The element type each array was made with, when it is not object (an array not found here is an object[]). Weak,
    /// so an array the design drops is collected with its entry.
    /// </summary>
    private readonly ConditionalWeakTable<object?[], ITypeSymbol> arrayElementTypes = new();

    /// <summary>
    /// Records the element type of an array just made (by <c>new</c>, a collection expression, a params argument, or a
    /// library or DSL call whose result is an array). An array already recorded keeps its type: a call that returns an
    /// array it was given returns it under its static type, which may be a base of the type it was made with.
    /// </summary>
    private object?[] Typed(object?[] array, ITypeSymbol elementType, Frame? frame)
    {
        var element = Resolved(elementType, frame) ?? elementType;
        if (element.SpecialType != SpecialType.System_Object && !arrayElementTypes.TryGetValue(array, out _))
            arrayElementTypes.Add(array, element);
        return array;
    }

    /// <summary>A value that a call typed as an array returns, recorded with that array's element type.</summary>
    /// <remarks>The library's generics run erased, so Array.Empty&lt;T&gt;() hands every T the same empty array: one already
    /// recorded with another element type is replaced by an empty array of this one.</remarks>
    private object? TypedIfArray(object? value, ITypeSymbol? type, Frame? frame)
    {
        if (value is not object?[] array || type is not IArrayTypeSymbol { Rank: 1 } arrayType)
            return value;
        if (array.Length == 0 && arrayElementTypes.TryGetValue(array, out var recorded)
            && !SymbolEqualityComparer.Default.Equals(recorded, Resolved(arrayType.ElementType, frame)))
            array = new object?[0];
        return Typed(array, arrayType.ElementType, frame);
    }

    /// <summary>An array's Clone (typed object by the library): an array of the original's element type.</summary>
    private object?[] CloneOf(object?[] original, object?[] clone)
    {
        if (arrayElementTypes.TryGetValue(original, out var element) && !arrayElementTypes.TryGetValue(clone, out _))
            arrayElementTypes.Add(clone, element);
        return clone;
    }

    /// <summary>
    /// Whether the array may be seen under an element type other than its own (array covariance: only then can a store
    /// be refused). Not when it was made with the element type the code sees, or with a value type.
    /// </summary>
    private bool MayBeCovariant(object?[] array, ITypeSymbol? seenElementType, Frame frame)
    {
        // Nothing derives from a struct or a sealed class: an array seen with such an element type is of that type (and
        // the store, on the hot path of every array write, needs no lookup).
        if (seenElementType is { IsValueType: true } or { IsSealed: true, TypeKind: TypeKind.Class })
            return false;
        var element = ElementTypeOf(array);
        if (element is { IsValueType: true }) return false;
        return element is null || seenElementType is null || !SymbolEqualityComparer.Default.Equals(element, Resolved(seenElementType, frame));
    }

    /// <summary>The element type an array was made with; null when it is not known (generic code whose type argument is not
    /// known where it ran, or a typed array of the library's of a type the compilation cannot name).</summary>
    private ITypeSymbol? ElementTypeOf(object?[] array)
    {
        if (arrayElementTypes.TryGetValue(array, out var element))
            return element is ITypeParameterSymbol ? null : element;
        var clrElement = array.GetType().GetElementType()!;
        if (clrElement == typeof(object))
            return session.Compilation.ObjectType;
        // A typed array the library or the DSL made (string[] from Split), held as it is.
        return clrElement.IsGenericType || clrElement.FullName is null ? null : session.Compilation.GetTypeByMetadataName(clrElement.FullName);
    }

    /// <summary>Is the array of <paramref name="type"/> (an array, interface or base type)? Null when that cannot be decided.</summary>
    private bool? ArrayIsOfType(object?[] array, ITypeSymbol type)
    {
        if (ElementTypeOf(array) is not { } element)
            return IsOfEveryArray(type) ? true : null;
        return ConvertsByReference(session.Compilation.CreateArrayTypeSymbol(element), type);
    }

    private static bool IsOfEveryArray(ITypeSymbol type)
        => type.SpecialType is SpecialType.System_Object or SpecialType.System_Array or SpecialType.System_Collections_IEnumerable
            || type.ToDisplayString() is "System.Collections.ICollection" or "System.Collections.IList" or "System.ICloneable"
                or "System.Collections.IStructuralComparable" or "System.Collections.IStructuralEquatable";

    /// <summary>
    /// Whether a value may be stored in the array: null or of its element type. When not, the store throws
    /// ArrayTypeMismatchException as at run time (a string[] seen as object[] given an int); when that cannot be
    /// decided it is reported. Either way the slot is left as it was, and false is returned.
    /// </summary>
    private bool StoreFits(object?[] array, object? value, IOperation site, Frame frame)
    {
        if (value is null || Unknown.Is(value))
            return true;
        var element = ElementTypeOf(array);
        // Only an array of a reference type can be seen under another element type; a value the compiler typed for a
        // struct array fits it (numbers may be held wider than declared, so they are not tested).
        if (element is { SpecialType: SpecialType.System_Object } or { IsValueType: true })
            return true;
        var fits = element is null ? null : IsOfType(value, element, frame);
        if (fits is true)
            return true;
        if (fits is null)
        {
            Unsupported(site, "this store into an array", "the array's element type is not known here, so whether it takes the value cannot be decided");
            return false;
        }

        Throws(site.Syntax, "ArrayTypeMismatchException: an array of " + Describe(element!) + " cannot hold " + DescribeValueType(value));
        return false;
    }

    /// <summary>
    /// System.Array's members that store into an array they are given: SetValue, Copy, ConstrainedCopy and CopyTo. To the
    /// library every array of the interpreter's is an object[], so the element type of an array of a reference type is
    /// checked here (an array of a value type is not: .NET widens numbers there, and the values are the compiler's). A SetValue that does
    /// not fit throws InvalidCastException, as .NET does; a copy with an element that does not fit the destination is
    /// reported (.NET throws partway, and where it stops is not modelled). Null when the call may go ahead.
    /// </summary>
    private object? RefusedArrayStore(IOperation site, IMethodSymbol method, object? receiver, object?[] arguments)
    {
        if (method.ContainingType?.SpecialType != SpecialType.System_Array)
            return null;
        switch (method.Name)
        {
            case "SetValue" when receiver is object?[] array && arguments.Length > 0:
                if (arguments[0] is null || Unknown.Is(arguments[0]) || ElementTypeOf(array) is { SpecialType: SpecialType.System_Object } or { IsValueType: true })
                    return null;
                if (ElementTypeOf(array) is not { } element || IsOfType(arguments[0], element, null) is not { } fits)
                    return Unsupported(site, "the call to " + Describe(method), "the array's element type is not known here, so whether it takes the value cannot be decided");
                if (fits)
                    return null;
                Throws(site.Syntax, "InvalidCastException: an array of " + Describe(element) + " cannot hold " + DescribeValueType(arguments[0]!));
                return Unknown.Value;

            case "Copy" or "ConstrainedCopy" or "CopyTo":
                var source = method.Name == "CopyTo" ? receiver : arguments[0];
                var destination = method.Name == "CopyTo" ? arguments[0] : arguments.Length == 3 ? arguments[1] : arguments.Length > 2 ? arguments[2] : null;
                if (source is not object?[] from || destination is not object?[] to || ElementTypeOf(to) is { SpecialType: SpecialType.System_Object } or { IsValueType: true })
                    return null;
                var target = ElementTypeOf(to);
                foreach (var item in from)
                {
                    if (item is null || Unknown.Is(item)) continue;
                    if (target is null || IsOfType(item, target, null) is not true)
                        return Unsupported(site, "the call to " + Describe(method), target is null
                            ? "the destination's element type is not known here"
                            : "an element of the source is not " + Describe(target) + ": .NET throws partway through the copy, and where it stops is not modelled");
                }

                return null;

            default:
                return null;
        }
    }

    private string DescribeValueType(object value) => value switch
    {
        InterpretedObject instance => Describe(instance.Type),
        EnumValue enumValue => Describe(enumValue.Type),
        object?[] array => (ElementTypeOf(array) is { } element ? Describe(element) : "an unknown type") + "[]",
        _ => value.GetType().Name,
    };
}
