using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Reflection;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;
using Phaseward.Checking;

namespace Phaseward.Analyzers.Elaboration;

// Values crossing into native code (the DSL and the pure library members of Library) and back. Arrays are object?[]
// and lists List<object?> inside the interpreter; closures become delegates that call back; lazy sequences are metered
// (each element is a step) so a library call cannot run away; sizes given to the library are charged to the memory
// budget before the call.
internal sealed partial class Interpreter
{
    private object? ToClr(object? value, Type type)
    {
        if (type.IsByRef) type = type.GetElementType()!;
        var underlying = Nullable.GetUnderlyingType(type) ?? type;
        switch (value)
        {
            case null:
                return null;
            case Closure closure when typeof(Delegate).IsAssignableFrom(type):
                return (object?)ToDelegate(closure, type) ?? Unconvertible.Value;
            case Closure when type == typeof(object):
                // Kept as it is in a collection of delegates (List<Func<Net, Net>> is erased to List<object>): it is only
                // called when the design's code takes it out and calls it, through the interpreter.
                return value;
            case Closure:
                return Unconvertible.Value;
            case object?[] items when type.IsArray:
                return type == typeof(object[]) ? items : TypedArray(items, type.GetElementType()!);
            case List<object?> list when type.IsArray:
                return TypedArray(list.ToArray(), type.GetElementType()!);
            case IndexValue index when type.FullName == "System.Index":
                return IndexToClr(index, type);
            case RangeValue range when type.FullName == "System.Range":
                return Activator.CreateInstance(type, IndexToClr(range.Start, type.GetProperty("Start")!.PropertyType), IndexToClr(range.End, type.GetProperty("End")!.PropertyType));
            case TupleValue tuple when type.IsGenericType && type.FullName?.StartsWith("System.ValueTuple`", StringComparison.Ordinal) == true:
                return ValueTupleToClr(tuple, type);
        }

        if (type.IsInstanceOfType(value) && !(value is IEnumerable && !IsMaterialized(value) && type != typeof(object)))
            return value;

        // A string is a sequence of chars to a parameter it is not itself (LINQ's IEnumerable<T>, erased to object here).
        if (value is IEnumerable sequence && SequenceElementType(type) is { } elementType)
        {
            // A plain sequence parameter gets a metered, converted sequence; a list or array parameter (the DSL's) a typed copy.
            if (type == typeof(IEnumerable) || type.IsGenericType && type.GetGenericTypeDefinition() == typeof(IEnumerable<>))
                return Metered(sequence, elementType);
            if (TypedArray(Materialize(sequence), elementType) is not Array array) return Unconvertible.Value;
            if (type.IsAssignableFrom(array.GetType())) return array;
            var list = typeof(List<>).MakeGenericType(elementType);
            return type.IsAssignableFrom(list) ? Activator.CreateInstance(list, array) : Unconvertible.Value;
        }

        if (ErasedComparers.Adapt(value, type) is { } comparer)
            return comparer;
        if (value is InterpretedObject designSequence && SequenceElementType(type) is not null && GetEnumeratorOf(designSequence.Type) is { } getEnumerator)
            return EnumeratedForLibrary(designSequence, getEnumerator) is { } items ? ToClr(items, type) : Unconvertible.Value;
        if (value is InterpretedObject or TupleValue)
            return type == typeof(object) ? value : Unconvertible.Value;
        if (underlying.IsEnum && value is not Enum)
            return Enum.ToObject(underlying, value);
        if (underlying.IsPrimitive && value.GetType() != underlying && value is IConvertible)
            return System.Convert.ChangeType(value, underlying, CultureInfo.InvariantCulture);
        if (underlying == typeof(decimal) && value is IConvertible && value is not decimal)
            return System.Convert.ToDecimal(value, CultureInfo.InvariantCulture);
        return value;
    }

    /// <summary>Collections whose size is already paid for (arrays, lists, sets, dictionaries, strings): not metered again.</summary>
    /// <remarks>Passed as they are, so the library takes the paths it takes for them at run time (a HashSet given to
    /// SymmetricExceptWith is used as a set, in its order).</remarks>
    private static bool IsMaterialized(object value)
        => value is Array or string or CheckedCastView || value is ICollection or ISet<object?> && value.GetType().Namespace == "System.Collections.Generic";

    // The interpreter's ^i as the runtime's System.Index (the analyzer's netstandard2.0 has none: made by reflection).
    private static object IndexToClr(IndexValue index, Type indexType) => Activator.CreateInstance(indexType, index.Value, index.FromEnd)!;

    private static Type? SequenceElementType(Type type)
    {
        if (type.IsArray) return type.GetElementType();
        if (type == typeof(IEnumerable)) return typeof(object);
        if (!type.IsGenericType) return null;
        var definition = type.GetGenericTypeDefinition();
        if (definition == typeof(IEnumerable<>) || definition == typeof(IReadOnlyList<>) || definition == typeof(IReadOnlyCollection<>)
            || definition == typeof(IList<>) || definition == typeof(ICollection<>) || definition == typeof(List<>))
            return type.GetGenericArguments()[0];
        return null;
    }

    private object?[] Materialize(IEnumerable sequence)
    {
        if (sequence is object?[] array) return array;
        var items = new List<object?>();
        foreach (var item in Metered(sequence, typeof(object)) is IEnumerable<object?> metered ? metered : Array.Empty<object?>())
            items.Add(item);
        return items.ToArray();
    }

    // A typed copy, or Unconvertible when an element is not of the element type (code that does not compile, such
    // as an array of nets holding a broken expression): the call is then reported as not evaluable, never half-made.
    private object TypedArray(object?[] items, Type elementType)
    {
        var array = Array.CreateInstance(elementType, items.Length);
        for (var i = 0; i < items.Length; i++)
        {
            var item = ToClr(items[i], elementType);
            if (item is Unconvertible || item is null && elementType.IsValueType && Nullable.GetUnderlyingType(elementType) is null
                || item is not null && !elementType.IsInstanceOfType(item))
                return Unconvertible.Value;
            array.SetValue(item, i);
        }

        return array;
    }

    private static readonly MethodInfo MeteredDefinition = typeof(Interpreter).GetMethod(nameof(MeteredSequence), BindingFlags.NonPublic | BindingFlags.Instance)!;

    private object Metered(IEnumerable sequence, Type elementType) => MeteredDefinition.MakeGenericMethod(elementType).Invoke(this, new object[] { sequence, clrSite ?? Current! })!;

    // Every element of a sequence handed to a library method costs a step (so Range(0, int.MaxValue).ToArray() stops at
    // the step budget instead of taking the compiler's memory) and is converted to the element type the method wants.
    private IEnumerable<T> MeteredSequence<T>(IEnumerable sequence, IOperation site)
    {
        foreach (var item in sequence)
        {
            Step(site);
            if (Unknown.Is(item)) throw new UnknownValueException();
            var converted = typeof(T) == typeof(object) ? item : ToClr(FromClr(item), typeof(T));
            if (converted is Unconvertible) throw new InvalidCastException("an element cannot be given the type " + typeof(T).Name);
            yield return (T)converted!;
        }
    }

    // Kept out of ToClr: a lambda there would make the compiler allocate its closure on every call, tuple or not (every
    // DSL call passes through ToClr once per argument).
    private object? ValueTupleToClr(TupleValue tuple, Type type)
    {
        var elementTypes = type.GetGenericArguments();
        if (elementTypes.Length != tuple.Items.Length) return Unconvertible.Value;
        var items = new object?[elementTypes.Length];
        for (var i = 0; i < items.Length; i++)
            items[i] = ToClr(tuple.Items[i], elementTypes[i]);
        return Activator.CreateInstance(type, items);
    }

    /// <summary>Values the DSL and the library return, in the interpreter's shapes: arrays as object?[], tuples as TupleValue.</summary>
    private static object? FromClr(object? value)
    {
        switch (value)
        {
            case null or string:
                return value;
            case Array array when array is not object[] && array.Rank == 1:
                return array.Cast<object?>().ToArray();
        }

        var type = value.GetType();
        return type.IsGenericType && type.FullName!.StartsWith("System.ValueTuple`", StringComparison.Ordinal) ? ValueTupleFromClr(value, type) : value;
    }

    // Kept out of FromClr for the same reason as ValueTupleToClr: the closure over 'value' was allocated on every call.
    private static TupleValue ValueTupleFromClr(object value, Type type)
        => new(type.GetFields().OrderBy(f => f.Name, StringComparer.Ordinal).Take(7).Select(f => FromClr(f.GetValue(value))).ToArray());

    private static bool IsNullableMember(ISymbol member) => ClrTypes.MetadataName(member.ContainingType.OriginalDefinition) == "System.Nullable`1";

    /// <summary>
    /// A method of a nullable value type. Its value is kept as the underlying value or null, so its methods are answered
    /// here: GetValueOrDefault, Equals, GetHashCode and ToString, as Nullable&lt;T&gt; defines them.
    /// </summary>
    private object? CallNullableMember(IInvocationOperation invocation, IMethodSymbol method, object? receiver, Frame frame)
    {
        var (arguments, _) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        switch (method.Name)
        {
            case "GetValueOrDefault" when arguments.Length == 0:
                return receiver ?? DefaultOf(method.ContainingType.TypeArguments[0], frame);
            case "GetValueOrDefault" when arguments.Length == 1:
                return receiver ?? arguments[0];
            case "Equals" when arguments.Length == 1:
                return receiver is null ? arguments[0] is null : receiver.Equals(arguments[0]);
            case "GetHashCode" when arguments.Length == 0 && (receiver is null or EnumValue or Enum or decimal || receiver.GetType().IsPrimitive):
                return receiver?.GetHashCode() ?? 0;
            case "GetHashCode" when arguments.Length == 0 && receiver is InterpretedObject value && UserOverride(value.Type, "GetHashCode", 0) is not null:
                try
                {
                    return HashOf(value);
                }
                catch (UnknownValueException e)
                {
                    return UnknownFrom(e, invocation);
                }
            case "ToString" when arguments.Length == 0:
                try
                {
                    return receiver is null ? "" : Arithmetic.Text(receiver);
                }
                catch (UnknownValueException e)
                {
                    return UnknownFrom(e, invocation);
                }
            default:
                return Unsupported(invocation, "the call to " + Describe(method), "it is not a member of Nullable<T> the elaborator answers");
        }
    }

    // ---- library members other than calls ----

    private object? ReadLibraryProperty(IPropertyReferenceOperation reference, IPropertySymbol property, object? receiver, Frame frame)
    {
        if (IsNullableMember(property))
        {
            if (property.Name == "HasValue") return receiver is not null;
            if (property.Name == "Value")
                return receiver ?? Raise(reference.Syntax, new InvalidOperationException("Nullable object must have a value."));
        }

        if (property.GetMethod is not { } getter)
            return Unsupported(reference, "property " + Describe(property), "it has no getter");
        Step(reference);
        var (arguments, _) = Arguments(reference.Arguments, getter, frame);
        return arguments is null ? Unknown.Value : CallClr(reference, getter, receiver, arguments);
    }

    private object? ReadLibraryField(IFieldReferenceOperation reference, IFieldSymbol field, Frame frame)
    {
        var owner = field.IsStatic ? null : reference.Instance is null ? null : Evaluate(reference.Instance, frame);
        if (Unknown.Is(owner)) return owner;
        var type = field.ContainingType is null ? null : Library.Erase(field.ContainingType);
        var info = type?.GetField(field.Name, BindingFlags.Public | (field.IsStatic ? BindingFlags.Static : BindingFlags.Instance));
        if (info is null)
            return Unsupported(reference, "field " + Describe(field), "it was not found in the library");
        return FromClr(info.GetValue(owner));
    }

    private object? CreateLibraryObject(IObjectCreationOperation creation, IMethodSymbol constructor, Frame frame)
    {
        Step(creation);
        var (arguments, _) = Arguments(creation.Arguments, constructor, frame);
        if (arguments is null) return Unknown.Value;
        var made = CallClr(creation, constructor, null, arguments, frame: frame);
        return made is null || Unknown.Is(made) ? made : Initialize(creation, made, frame);
    }

    // ---- memory ----

    private static readonly HashSet<string> SizeParameters = new(StringComparer.Ordinal) { "count", "capacity", "totalWidth", "repeatCount", "length", "newSize", "minimumLength" };

    /// <summary>Charges the sizes a library call is asked to allocate (a string of count chars, a list of capacity slots) before it runs.</summary>
    private bool ChargeSizes(IOperation site, MethodBase member, object?[] arguments)
    {
        var parameters = member.GetParameters();
        var perUnit = member.DeclaringType == typeof(string) || member.DeclaringType == typeof(System.Text.StringBuilder) ? 2L : 8L;
        for (var i = 0; i < parameters.Length && i < arguments.Length; i++)
            if (SizeParameters.Contains(parameters[i].Name ?? "") && arguments[i] is int or long && member.DeclaringType != typeof(Enumerable))
                ChargeMemory(site, perUnit * System.Convert.ToInt64(arguments[i], CultureInfo.InvariantCulture));
        return true;
    }

    /// <summary>Charges what a library call made: strings, arrays and new collections.</summary>
    private void Charge(IOperation site, object? result)
    {
        switch (result)
        {
            case string text:
                ChargeMemory(site, 2L * text.Length);
                break;
            case Array array:
                ChargeMemory(site, 8L * array.LongLength);
                break;
            case ICollection collection when site is IObjectCreationOperation || site is IInvocationOperation { TargetMethod.Name: var name } && name.StartsWith("To", StringComparison.Ordinal):
                ChargeMemory(site, 8L * collection.Count);
                break;
        }
    }

    /// <summary>Counts bytes the design's code allocates; past the budget elaboration stops with PW9002 at that allocation.</summary>
    private void ChargeMemory(IOperation site, long bytes)
    {
        if (bytes <= 0)
            return;
        allocatedBytes += bytes;
        if (allocatedBytes > limits.MemoryBudget || bytes > limits.MemoryBudget)
        {
            Report(RuleCatalog.ElaborationBudgetExceeded.Id, site.Syntax, DesignName,
                $"the memory budget of {limits.MemoryBudget} bytes (arrays, strings and collections the design's code makes; phaseward.elaboration_memory_budget) would be exceeded by {bytes} more");
            throw new ElaborationStopped();
        }
    }
}
