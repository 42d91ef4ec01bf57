package dev.rootform.maven;

import java.io.File;
import java.io.IOException;
import org.apache.maven.plugin.AbstractMojo;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugins.annotations.LifecyclePhase;
import org.apache.maven.plugins.annotations.Mojo;
import org.apache.maven.plugins.annotations.Parameter;
import org.apache.maven.project.MavenProject;

/**
 * Goal {@code generate}: solves every spec file ({@code *.json}) of {@link #specDirectory} and writes
 * its verified Java evaluator under {@link #outputDirectory}, which is added as a compile source
 * root. A spec that is bad input, fails a check or has no fitted solution fails the build with the
 * spec's path and the message. A spec whose bytes and the plugin version are unchanged since the
 * last run is not generated again. The spec format is that of
 * {@link dev.rootform.api.batch.EvaluatorSpec}.
 */
@Mojo(name = "generate", defaultPhase = LifecyclePhase.GENERATE_SOURCES, threadSafe = true)
public final class GenerateMojo extends AbstractMojo {
    /** Where the spec files are. */
    @Parameter(property = "rootform.specDirectory", defaultValue = "${project.basedir}/src/main/rootform")
    File specDirectory;

    /** Where the Java sources go (a compile source root). */
    @Parameter(property = "rootform.outputDirectory", defaultValue = "${project.build.directory}/generated-sources/rootform")
    File outputDirectory;

    /** Where the stamps of the last run are kept (one per spec). */
    @Parameter(defaultValue = "${project.build.directory}/rootform-stamps")
    File stateDirectory;

    /** Skip the goal. */
    @Parameter(property = "rootform.skip", defaultValue = "false")
    boolean skip;

    @Parameter(defaultValue = "${plugin.version}", readonly = true, required = true)
    String pluginVersion;

    @Parameter(defaultValue = "${project}", readonly = true, required = true)
    MavenProject project;

    @Override
    public void execute() throws MojoExecutionException, MojoFailureException {
        if (skip) {
            getLog().info("rootform: skipped");
            return;
        }
        EvaluatorSources.Summary summary;
        try {
            summary = new EvaluatorSources(specDirectory.toPath(), outputDirectory.toPath(), stateDirectory.toPath(), pluginVersion,
                    project.getBasedir().toPath()).update();
        } catch (IOException e) {
            throw new MojoExecutionException("rootform: cannot read the specs or write the sources: " + e.getMessage(), e);
        }
        project.addCompileSourceRoot(outputDirectory.getPath());
        getLog().info(String.format("rootform: %d evaluator(s) generated, %d up to date, %d removed", summary.generated(),
                summary.upToDate(), summary.removed()));
        if (!summary.failures().isEmpty()) {
            summary.failures().forEach(f -> getLog().error("rootform: " + f));
            throw new MojoFailureException(String.join(System.lineSeparator(), summary.failures()));
        }
    }
}
