using LunarShadow.Api.Formatting;
using LunarShadow.Api.Validation;

namespace LunarShadow.Api.Common;

/// <summary>The representations one endpoint offers, and its <c>format</c> parameter listing their names.</summary>
internal sealed class FormatOffer(params OutputFormat[] formats)
{
    /// <summary>The formats, the default first.</summary>
    public IReadOnlyList<OutputFormat> Formats => formats;

    /// <summary>The <c>format</c> parameter of the endpoint.</summary>
    public Parameter Parameter { get; } = Parameters.Format(ContentNegotiation.Names(formats).ToList());

    /// <summary>
    /// The chosen format: <c>?format=</c> wins (an unknown name is a problem on the reader), else the Accept header; null
    /// when the Accept header admits none of them (the caller answers 406).
    /// </summary>
    public OutputFormat? Choose(HttpRequest request, RequestFields f)
    {
        if (!f.Has(Parameter)) return ContentNegotiation.FromAccept(request, formats);
        var name = f.Choice(Parameter);
        return formats.FirstOrDefault(x => ContentNegotiation.Name(x) == name, formats[0]);
    }
}
