namespace LunarShadow.Api.Common;

/// <summary>OpenAPI conventions several feature endpoints share.</summary>
internal static class EndpointConventions
{
    /// <summary>The problem responses of a GET that finds one eclipse by its date: 400, 404 and 406.</summary>
    public static RouteHandlerBuilder ProducesEclipseProblems(this RouteHandlerBuilder builder) => builder
        .ProducesValidationProblem()
        .ProducesProblem(StatusCodes.Status404NotFound)
        .ProducesProblem(StatusCodes.Status406NotAcceptable);
}
