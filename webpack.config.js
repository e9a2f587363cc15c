// Build: functions.js (self-contained: registers every ZC.* function), functions.json (metadata
// from the JSDoc), taskpane.html/.js (shared runtime page), help.html and help.css (the users' help
// page, scripts/helpPage.ts: an entry per function from the declarations and definitions, examples
// computed), the manifest and icons. `--env url=https://host/path/` rewrites every
// https://localhost:3000/ URL (the help page holds none: it is the same for every host).
import CopyWebpackPlugin from "copy-webpack-plugin";
import CustomFunctionsMetadataPlugin from "custom-functions-metadata-plugin";
import HtmlWebpackPlugin from "html-webpack-plugin";
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";
import { readFileSync } from "node:fs";
import { tsImport } from "tsx/esm/api";
import { fileURLToPath } from "node:url";

const devUrl = "https://localhost:3000/";
const root = fileURLToPath(new URL(".", import.meta.url));
/** The declaration files, one per family of functions (the metadata plugin reads their JSDoc). */
const declarationFiles = JSON.parse(readFileSync(`${root}functions/declarationFiles.json`, "utf8"));

/** Name and description of each worksheet function, for the pane's reference outside Excel. */
async function functionList() {
  const result = await generateCustomFunctionsMetadata(declarationFiles.map((f) => `${root}${f}`), false);
  return JSON.parse(result.metadataJson).functions.map((f) => ({ name: f.id, description: f.description }));
}

export default async (env = {}, argv = {}) => {
  const base = env.url ? (env.url.endsWith("/") ? env.url : `${env.url}/`) : devUrl;
  const origin = new URL(base).origin;
  const rewrite = (text) =>
    text
      .replaceAll("<AppDomain>https://localhost:3000</AppDomain>", `<AppDomain>${origin}</AppDomain>`)
      .replaceAll(devUrl, base);
  const production = argv.mode === "production";
  return {
    mode: production ? "production" : "development",
    devtool: production ? false : "source-map",
    context: root,
    entry: {
      functions: "./functions/functions.ts",
      taskpane: "./taskpane/taskpane.ts",
    },
    output: {
      path: `${root}dist`,
      filename: "[name].js",
      clean: true,
    },
    target: ["web", "es2020"],
    resolve: {
      extensions: [".ts", ".js"],
      extensionAlias: { ".js": [".ts", ".js"] },
    },
    module: {
      rules: [{ test: /\.ts$/, loader: "ts-loader", options: { transpileOnly: true }, exclude: /node_modules/ }],
    },
    optimization: {
      splitChunks: false,
      runtimeChunk: false,
    },
    performance: { hints: false },
    plugins: [
      new (await import("webpack")).default.DefinePlugin({ __ZC_FUNCTIONS__: JSON.stringify(await functionList()) }),
      new CustomFunctionsMetadataPlugin({ output: "functions.json", input: declarationFiles.map((f) => `./${f}`) }),
      new HtmlWebpackPlugin({
        filename: "taskpane.html",
        template: "./taskpane/taskpane.html",
        chunks: ["functions", "taskpane"],
        chunksSortMode: "manual",
        scriptLoading: "defer",
      }),
      new CopyWebpackPlugin({
        patterns: [
          { from: "manifest/manifest.xml", to: "manifest.xml", transform: (content) => rewrite(content.toString()) },
          { from: "manifest/assets", to: "assets" },
          { from: "taskpane/taskpane.css", to: "taskpane.css" },
        ],
      }),
      {
        // the help page, built from the same declarations and definitions (scripts/helpPage.ts)
        apply(compiler) {
          compiler.hooks.thisCompilation.tap("HelpPage", (compilation) => {
            compilation.hooks.processAssets.tapPromise({ name: "HelpPage", stage: compilation.constructor.PROCESS_ASSETS_STAGE_ADDITIONAL }, async () => {
              const { helpPage } = await tsImport("./scripts/helpPage.ts", import.meta.url);
              const { html, css } = await helpPage();
              const { RawSource } = compiler.webpack.sources;
              compilation.emitAsset("help.html", new RawSource(html));
              compilation.emitAsset("help.css", new RawSource(css));
            });
          });
        },
      },
      {
        // functions.json carries help URLs: point them at the same host as the manifest
        apply(compiler) {
          compiler.hooks.thisCompilation.tap("RewriteMetadataUrls", (compilation) => {
            compilation.hooks.processAssets.tap(
              { name: "RewriteMetadataUrls", stage: compilation.constructor.PROCESS_ASSETS_STAGE_OPTIMIZE },
              () => {
                const asset = compilation.getAsset("functions.json");
                if (!asset) return;
                const { RawSource } = compiler.webpack.sources;
                compilation.updateAsset("functions.json", new RawSource(rewrite(asset.source.source().toString())));
              },
            );
          });
        },
      },
    ],
  };
};
