using LunarShadow.Api.Hosting;

// `--health-probe URL`: exit 0 when URL answers 200 (the container health check; the runtime image has no curl).
if (args is ["--health-probe", var probe])
    return await HealthProbe.RunAsync(new Uri(probe));

// `keys add "Name" | list | revoke <name-or-id>`: manage the observatory keys on the configured database.
if (args is [LunarShadow.Api.Observations.Keys.KeysCommand.Verb, .. var keyArgs])
    return await LunarShadow.Api.Observations.Keys.KeysCommand.RunAsync(keyArgs, LunarShadow.Api.Observations.Keys.KeysCommand.HostConfiguration(), Console.Out, Console.Error);

var builder = WebApplication.CreateBuilder(args);
builder.AddLunarShadowServices();

var app = builder.Build();
app.UseLunarShadowPipeline();
app.MapLunarShadowEndpoints();
app.Run();
return 0;

/// <summary>The web host's entry point (public for the API tests' WebApplicationFactory).</summary>
public partial class Program;
