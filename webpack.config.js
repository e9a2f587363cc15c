// Build: functions.js (self-contained: registers every ZC.* function), functions.json (metadata
// from the JSDoc), taskpane.html/.js (shared runtime page), help.html (from README.md), the
// manifest and icons. `--env url=https://host/path/` rewrites every https://localhost:3000/ URL.
import CopyWebpackPlugin from "copy-webpack-plugin";
import CustomFunctionsMetadataPlugin from "custom-functions-metadata-plugin";
import HtmlWebpackPlugin from "html-webpack-plugin";
import { generateCustomFunctionsMetadata } from "custom-functions-metadata";
import { marked } from "marked";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";

const devUrl = "https://localhost:3000/";
const root = fileURLToPath(new URL(".", import.meta.url));
/** The declaration files, one per family of functions (the metadata plugin reads their JSDoc). */
const declarationFiles = JSON.parse(readFileSync(`${root}functions/declarationFiles.json`, "utf8"));

/**
 * The README sections a user of a hosted add-in reads (what zcell does, how to share workbooks and what
 * the pane writes, the function reference and conventions); the install, development and testing
 * sections speak to a developer with a local server and stay out of a hosted build's help page.
 */
const hostedSections = ["Sharing workbooks", "Security", "Function reference", "Model spec", "Models of this workbook", "Presets", "Conventions", "Units", "Errors"];

/** The README for the help page of a build served from `base`: for a hosted build, the user's sections and how to report a problem. */
function helpMarkdown(markdown, hosted) {
  if (!hosted) return markdown;
  const parts = markdown.split(/^(?=#{1,3} )/m);
  const kept = parts.filter((part, i) => {
    if (i === 0) return true; // the title and the caution that results depend on the assumed cosmology
    const heading = /^#{1,3} (.*)$/m.exec(part)[1].trim();
    return hostedSections.includes(heading);
  });
  // the dev server's bullet of the Security section is about npm start on a developer's machine
  const text = kept.join("").replace(/^- \*\*The dev server\*\*[^]*?(?=^\S|^- |(?![^]))/m, "");
  return `${text}\n## Reporting a problem\n\nTell the people who host zcell for you: the cell, its formula, the value you expected and the one shown, and the model (\`=ZC.DESCRIBE()\` writes it out). \`=ZC.VERSION()\` gives the version.\n`;
}

/** README as a page; headings get ids (GitHub-style slugs) so that help links can point at sections. */
function helpPage(markdown) {
  const slug = (html) =>
    html.replace(/<[^>]+>/g, "").trim().toLowerCase().replace(/[^\p{L}\p{N}\s-]/gu, "").replace(/\s+/g, "-");
  const body = marked
    .parse(markdown, { async: false })
    .replace(/<h([1-6])>(.*?)<\/h\1>/g, (_, level, inner) => `<h${level} id="${slug(inner)}">${inner}</h${level}>`);
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>zcell help</title>
<meta http-equiv="Content-Security-Policy" content="default-src 'self'; img-src 'self' data:"></head>
<body>${body}</body></html>`;
}

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
          { from: "README.md", to: "help.html", transform: (content) => helpPage(helpMarkdown(content.toString(), Boolean(env.url))) },
        ],
      }),
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
