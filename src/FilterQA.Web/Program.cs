using FilterQA.Web.Hosting;

WebApplicationBuilder builder = WebApplication.CreateBuilder(RepositoryPaths.HostOptions(args));
builder.AddFilterQaWeb();

WebApplication app = builder.Build();
app.UseFilterQaWeb();
app.Run();
