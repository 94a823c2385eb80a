using System.Text.Json;
using LunarShadow.Astronomy.Eclipses;

namespace LunarShadow.Api.Common;

/// <summary>
/// The one naming policy for enum values on the wire: kebab-case lower ("civil-twilight", "hidden-by-horizon-profile").
/// The JSON options' enum converter and every mapping use it; the OpenAPI document lists the same names as enums.
/// </summary>
internal static class WireNames
{
    /// <summary>The policy.</summary>
    public static readonly JsonNamingPolicy Policy = JsonNamingPolicy.KebabCaseLower;

    /// <summary>The wire name of an enum value.</summary>
    public static string Of<T>(T value) where T : struct, Enum => Policy.ConvertName(value.ToString());

    /// <summary>Every wire name of an enum, in declaration order.</summary>
    public static IReadOnlyList<string> All<T>() where T : struct, Enum => Enum.GetValues<T>().Select(Of).ToList();

    /// <summary>Contact names as the trade writes them (P1 … P4), with "greatest" between U2 and U3.</summary>
    public static IReadOnlyList<string> Contacts { get; } = ["P1", "U1", "U2", "greatest", "U3", "U4", "P4"];

    /// <summary>The name of a contact.</summary>
    public static string Of(ContactName contact) => contact.ToString();
}
