using System;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace Phaseward.Analyzers.Elaboration;

// The System.Enum members on the design's own enums (see EnumValue): they cannot run natively, since the enum exists
// only as a symbol, so they are answered here from the enum's declaration, as .NET defines them.
internal sealed partial class Interpreter
{
    /// <summary>An instance member of System.Enum (or object) called on a value of the design's enum.</summary>
    private object? CallEnumMember(IInvocationOperation invocation, EnumValue value, IMethodSymbol method, Frame frame)
    {
        var (arguments, _) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        try
        {
            return (method.Name, arguments.Length) switch
            {
                ("ToString", 0) => ValueText.Of(value),
                ("ToString", 1) when arguments[0] is string or null => ValueText.Of(value, null, arguments[0] as string),
                ("HasFlag", 1) when arguments[0] is EnumValue flag && SymbolEqualityComparer.Default.Equals(flag.Type, value.Type) => (value.Value & flag.Value) == flag.Value,
                ("HasFlag", 1) when arguments[0] is not null => Raise(invocation.Syntax, new ArgumentException("The argument type is not the same as the enum type '" + value.Type.Name + "'.")),
                ("Equals", 1) => value.Equals(arguments[0]),
                ("GetHashCode", 0) => value.GetHashCode(),
                ("CompareTo", 1) => value.CompareTo(arguments[0]),
                _ => Unsupported(invocation, "the call to " + Describe(method), "of the design's own enums the elaborator answers ToString, HasFlag, Equals, GetHashCode and CompareTo"),
            };
        }
        catch (UnknownValueException e)
        {
            return UnknownFrom(e, invocation);
        }
        catch (ArgumentException e)
        {
            return Raise(invocation.Syntax, e);
        }
    }

    /// <summary>The design's enum a static System.Enum call is about (its type argument or its typeof argument), if any.</summary>
    private INamedTypeSymbol? DesignEnumOf(IInvocationOperation invocation, Frame frame)
    {
        var method = invocation.TargetMethod;
        if (!method.IsStatic || method.ContainingType is null || ClrTypes.MetadataName(method.ContainingType) != "System.Enum")
            return null;
        var type = method.TypeArguments.Length == 1 ? ResolvedIn(method.TypeArguments[0], frame)
            : invocation.Arguments.FirstOrDefault(a => a.Parameter?.Ordinal == 0)?.Value is ITypeOfOperation typeOf ? ResolvedIn(typeOf.TypeOperand, frame)
            : null;
        return type is INamedTypeSymbol { TypeKind: TypeKind.Enum } named && session.IsInSource(named) ? named : null;
    }

    /// <summary>
    /// <c>Enum.GetNames</c>, <c>GetValues</c>, <c>GetName</c>, <c>IsDefined</c>, <c>Parse</c> and <c>TryParse</c> for the
    /// design's enum (generic or with <c>typeof</c>); any other member of Enum is PW9001.
    /// </summary>
    private object? CallDesignEnumStatic(IInvocationOperation invocation, INamedTypeSymbol type, Frame frame)
    {
        var method = invocation.TargetMethod;
        var (arguments, references) = Arguments(invocation.Arguments, method, frame);
        if (arguments is null) return Unknown.Value;
        // The typeof argument of the non-generic forms is dropped: what remains is as in the generic forms.
        var rest = method.IsGenericMethod ? arguments : arguments.Skip(1).ToArray();
        var restReferences = method.IsGenericMethod ? references : references.Skip(1).ToArray();
        var sorted = EnumValue.SortedMembersOf(type);
        switch (method.Name, rest.Length)
        {
            case ("GetNames", 0):
                return sorted.Select(m => (object?)m.Name).ToArray();
            case ("GetValues", 0):
                return sorted.Select(m => (object?)new EnumValue(type, m.Value)).ToArray();
            case ("GetName", 1) when rest[0] is EnumValue named:
                var names = sorted.Where(m => m.Value == named.Value).Select(m => m.Name).Distinct().ToList();
                return names.Count <= 1 ? names.FirstOrDefault()
                    : Unsupported(invocation, "the name of the value " + named.Value.ToString(CultureInfo.InvariantCulture) + " of the enum " + type.Name,
                        "several members have that value, and which name .NET gives is not specified");
            case ("IsDefined", 1) when rest[0] is EnumValue defined:
                return sorted.Any(m => m.Value == defined.Value);
            case ("IsDefined", 1) when rest[0] is string name:
                return sorted.Any(m => m.Name == name);
            case ("Parse", 1 or 2) when rest[0] is string text && (rest.Length == 1 || rest[1] is bool):
                return ParseEnum(type, text, rest.Length == 2 && (bool)rest[1]!) is { } parsed
                    ? parsed
                    : Raise(invocation.Syntax, new ArgumentException("Requested value '" + text + "' was not found."));
            case ("TryParse", 2 or 3) when rest[0] is string or null && restReferences.Length == rest.Length && restReferences[rest.Length - 1] is { } result
                && (rest.Length == 2 || rest[1] is bool):
                var found = rest[0] is string s ? ParseEnum(type, s, rest.Length == 3 && (bool)rest[1]!) : null;
                result.Value = found ?? (method.IsGenericMethod ? new EnumValue(type, 0) : null);
                return found is not null;
            default:
                return Unsupported(invocation, "the call to " + Describe(method),
                    "of Enum the elaborator answers GetNames, GetValues, GetName, IsDefined, Parse and TryParse for the design's own enums");
        }
    }

    /// <summary>
    /// As <c>Enum.Parse</c>: a name, a number, or a comma-separated list of them (their bits combined), blanks around each
    /// part ignored. Null when the text is none of these.
    /// </summary>
    private static EnumValue? ParseEnum(INamedTypeSymbol type, string text, bool ignoreCase)
    {
        var members = EnumValue.MembersOf(type);
        long value = 0;
        foreach (var raw in text.Split(','))
        {
            var part = raw.Trim();
            if (part.Length == 0)
                return null;
            if (char.IsDigit(part[0]) || part[0] is '-' or '+')
            {
                if (!long.TryParse(part, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var number))
                    return null;
                value |= number;
                continue;
            }

            var comparison = ignoreCase ? StringComparison.OrdinalIgnoreCase : StringComparison.Ordinal;
            var match = members.Where(m => string.Equals(m.Name, part, comparison)).ToList();
            if (match.Count == 0)
                return null;
            value |= match[0].Value;
        }

        return new EnumValue(type, value);
    }
}
