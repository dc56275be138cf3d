using System;
using System.Collections;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Reflection;
using System.Text.RegularExpressions;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// The current culture in library calls (see ValueText for the rule). Library members run natively under the invariant
// culture, never the compiler's; one that formats, parses or changes case by the current culture gives its result only
// when the culture cannot change it, else PW9001.
internal sealed partial class Interpreter
{
    /// <summary>Library types whose members may read the current culture to format, parse or change case.</summary>
    private static readonly HashSet<string> CultureReaders = new(StringComparer.Ordinal)
    {
        "System.String", "System.Char", "System.Convert", "System.Text.StringBuilder", "System.Boolean", "System.Byte", "System.SByte",
        "System.Int16", "System.UInt16", "System.Int32", "System.UInt32", "System.Int64", "System.UInt64", "System.Single",
        "System.Double", "System.Decimal",
    };

    /// <summary>Their members that format, parse or change case (all of Convert's do).</summary>
    private static readonly HashSet<string> CultureReadingMembers = new(StringComparer.Ordinal)
    {
        "ToString", "Parse", "TryParse", "Format", "Concat", "Join", "ToUpper", "ToLower", "Append", "AppendLine", "AppendFormat", "AppendJoin", "Insert",
    };

    private static readonly Regex FormatItem = new(@"\{(\d+)\s*(?:,\s*-?\d+\s*)?(?::([^{}]*))?\}", RegexOptions.CultureInvariant);

    /// <summary>Does this library member read the current culture for what it gives (not only for how it compares strings)?</summary>
    private static bool MayReadCulture(IMethodSymbol method)
        => method.ContainingType is { } type && CultureReaders.Contains(ClrTypes.MetadataName(type.OriginalDefinition))
            && (CultureReadingMembers.Contains(method.Name) || type.SpecialType == SpecialType.None && type.Name == nameof(Convert))
            && !method.Parameters.Any(p => p.Type.Name is "IFormatProvider" or "CultureInfo" or "NumberFormatInfo")
            && method.Name is not ("ToUpperInvariant" or "ToLowerInvariant");

    /// <summary>
    /// Calls a library member under the invariant culture; for one that may read the current culture, also tells whether
    /// the culture could change what it gives. Null when it could not (the result is in <paramref name="result"/>);
    /// else why not, for PW9001.
    /// </summary>
    /// <param name="given">The arguments as the interpreter holds them (before their conversion to the member's types).</param>
    private static string? InvokeInCulture(MethodBase member, IMethodSymbol method, object? receiver, object?[] arguments, object?[]? given, out object? result)
    {
        var readsCulture = given is not null;
        if (readsCulture && method.Name is "ToUpper" or "ToLower")
        {
            // Case mappings differ by culture only for letters beyond ASCII and for i and I (Turkish, Azeri).
            var text = receiver as string ?? (receiver is char c ? c.ToString() : given!.FirstOrDefault() is char a ? a.ToString() : given!.FirstOrDefault() as string);
            if (text is null || text.Any(ch => ch > 127 || ch is 'i' or 'I'))
            {
                result = null;
                return "it changes case by the culture the design runs under, and the text has letters whose case differs between cultures (i, I, letters beyond ASCII); use ToUpperInvariant or ToLowerInvariant";
            }
        }

        // Values the call formats that the interpreter computes (objects of the design, lists of them): their own
        // text is the interpreter's, so only the numbers among them are tested, one by one.
        if (readsCulture && (!IsPlain(receiver) || given!.Any(a => !IsPlain(a)) || Mutators.Contains(method.Name)))
        {
            if (FormattedDependOnCulture(method, receiver, given!) is { } why)
            {
                result = null;
                return why;
            }

            result = InvokeUnder(CultureInfo.InvariantCulture, member, receiver, arguments);
            return null;
        }

        if (!readsCulture)
        {
            result = InvokeUnder(CultureInfo.InvariantCulture, member, receiver, arguments);
            return null;
        }

        // Plain values only (numbers, strings, arrays of them) and nothing changed: run again under a contrary culture.
        var again = (object?[])arguments.Clone();
        object? invariant, contrary;
        Exception? invariantFailure = null, contraryFailure = null;
        try
        {
            invariant = InvokeUnder(CultureInfo.InvariantCulture, member, receiver, arguments);
        }
        catch (TargetInvocationException e)
        {
            invariant = null;
            invariantFailure = e;
        }

        try
        {
            contrary = InvokeUnder(ValueText.Contrary, member, receiver, again);
        }
        catch (TargetInvocationException e)
        {
            contrary = null;
            contraryFailure = e;
        }

        if (invariantFailure?.InnerException?.GetType() != contraryFailure?.InnerException?.GetType() || !SameResult(invariant, contrary)
            || !arguments.SequenceEqual(again))
        {
            result = null;
            return "what it gives depends on the culture the design runs under (the decimal separator, the minus sign, group separators); pass CultureInfo.InvariantCulture";
        }

        if (invariantFailure is not null)
            throw invariantFailure;
        result = invariant;
        return null;
    }

    private static bool SameResult(object? a, object? b)
        => a is Array first && b is Array second ? first.Cast<object?>().SequenceEqual(second.Cast<object?>()) : Equals(a, b);

    // The elaboration runs in the invariant culture (DesignElaborator sets it on its thread); the contrary one is set only
    // for the duration of the second call. (RS1035 keeps analyzers from reading the culture for their own messages; this
    // is the design's library code, which must never see the compiler's.)
    private static object? InvokeUnder(CultureInfo culture, MethodBase member, object? receiver, object?[] arguments)
    {
        var thread = System.Threading.Thread.CurrentThread;
        var outer = thread.CurrentCulture;
        if (ReferenceEquals(outer, culture))
            return member is ConstructorInfo made ? made.Invoke(arguments) : member.Invoke(receiver, arguments);
        thread.CurrentCulture = culture;
        try
        {
            return member is ConstructorInfo constructor ? constructor.Invoke(arguments) : member.Invoke(receiver, arguments);
        }
        finally
        {
            thread.CurrentCulture = outer;
        }
    }

    /// <summary>A value library code formats without calling back into the interpreter: null, strings, numbers, arrays of them.</summary>
    private static bool IsPlain(object? value) => value switch
    {
        null or string or EnumValue or Enum => true,
        object?[] items => items.All(IsPlain),
        Array array => array.GetType().GetElementType()!.IsPrimitive,
        _ => value.GetType().IsPrimitive || value is decimal,
    };

    /// <summary>
    /// Why a call that formats values the interpreter holds (design objects, lists, mixed arrays) would give another text in
    /// another culture, or print an erased collection type; null when it would not.
    /// </summary>
    private static string? FormattedDependOnCulture(IMethodSymbol method, object? receiver, object?[] arguments)
    {
        var formats = new Dictionary<int, string?>();
        var composite = method.Name is "Format" or "AppendFormat" && arguments.FirstOrDefault() is string pattern;
        if (composite)
            foreach (Match item in FormatItem.Matches(((string)arguments[0]!).Replace("{{", "").Replace("}}", "")))
                formats[int.Parse(item.Groups[1].Value, CultureInfo.InvariantCulture)] = item.Groups[2].Success ? item.Groups[2].Value : null;

        var formatted = new List<(object? Value, string? Format)>();
        if (method.Name == "ToString" && receiver is not System.Text.StringBuilder)
            formatted.Add((receiver, arguments.FirstOrDefault() as string));
        var holes = composite ? arguments.Skip(1).SelectMany(a => a is object?[] many && arguments.Length == 2 ? many : new[] { a }).ToList() : null;
        if (holes is not null)
            formatted.AddRange(formats.Where(f => f.Key < holes.Count).Select(f => (holes[f.Key], f.Value)));
        else if (method.Name != "ToString")
            foreach (var argument in arguments)
                if (argument is IEnumerable sequence and not string)
                    formatted.AddRange(Materialized(sequence).Select(e => (e, (string?)null)));
                else
                    formatted.Add((argument, null));

        try
        {
            foreach (var (value, format) in formatted)
            {
                if (value is IFormattable formattable)
                    ValueText.CultureFree(formattable, format);
                else if (value is not null && ValueText.PrintsItsType(value) && !(method.Name == "ToString"))
                    return "it prints a collection's type, whose type arguments are not known here (the elaborator holds library collections with object elements)";
            }
        }
        catch (UnknownValueException e) when (e.Construct is { } construct)
        {
            return construct.What + ": " + construct.Why;
        }

        return null;
    }

    // Only collections already made are looked into (a lazy sequence is formatted as it is enumerated, by the library).
    private static IEnumerable<object?> Materialized(IEnumerable sequence)
        => sequence is ICollection ? sequence.Cast<object?>() : Enumerable.Empty<object?>();
}
