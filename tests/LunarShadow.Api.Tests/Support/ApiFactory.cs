using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Support;

/// <summary>One in-memory host shared by the tests of a class.</summary>
public sealed class ApiFactory : WebApplicationFactory<Program>;
