using Microsoft.AspNetCore.Hosting;
using Microsoft.AspNetCore.Mvc.Testing;

namespace LunarShadow.Api.Tests.Support;

/// <summary>
/// One in-memory host shared by the tests of a class. Its request deadline is generous: the test runner starts many
/// hosts at once on a machine that may be busy, and these tests check answers, not speed (DeadlineTests check the deadline).
/// </summary>
public sealed class ApiFactory : WebApplicationFactory<Program>
{
    protected override void ConfigureWebHost(IWebHostBuilder builder) => builder.UseSetting("RequestTimeoutSeconds", "300");
}
