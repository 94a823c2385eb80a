namespace LunarShadow.Api.Validation;

/// <summary>
/// What one endpoint takes, as endpoint metadata: its route and query parameters and, for a POST, the fields of its JSON
/// body (and of each object of a list in it). The handler reads exactly these through <see cref="RequestFields"/>, and
/// the OpenAPI document lists exactly these.
/// </summary>
/// <param name="Query">Route and query parameters.</param>
/// <param name="Body">Fields of the JSON body, for a POST.</param>
/// <param name="ListName">Name of a list of objects in the body ("sites"), if any.</param>
/// <param name="ListItem">Fields of each object of that list.</param>
/// <param name="MaxListItems">Most objects the list may hold.</param>
internal sealed record EndpointParameters(
    IReadOnlyList<Parameter> Query, IReadOnlyList<Parameter>? Body = null, string? ListName = null, IReadOnlyList<Parameter>? ListItem = null,
    int? MaxListItems = null);

/// <summary>Attaches an endpoint's parameter list.</summary>
internal static class EndpointParametersExtensions
{
    /// <summary>Declares what the endpoint takes (read by the handler and by the OpenAPI document).</summary>
    public static RouteHandlerBuilder Takes(this RouteHandlerBuilder builder, EndpointParameters parameters) => builder.WithMetadata(parameters);
}
