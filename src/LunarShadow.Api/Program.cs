using LunarShadow.Api.Hosting;
using Serilog;

Log.Logger = new LoggerConfiguration().WriteTo.Console().CreateBootstrapLogger();

var builder = WebApplication.CreateBuilder(args);
builder.AddLunarShadowServices();

var app = builder.Build();
app.UseLunarShadowPipeline();
app.MapLunarShadowEndpoints();
app.Run();

/// <summary>The web host's entry point (public for the API tests' WebApplicationFactory).</summary>
public partial class Program;
