/**
 * Builds the Excel add-in into dist/:
 *   functions.js    the ECHEM custom functions (wrappers + catalogue + engine)
 *   functions.json  their metadata, generated from the JSDoc of src/functions/functions.ts
 *   taskpane.html   the shared-runtime page: loads office.js, functions.js and taskpane.js
 *   taskpane.js     the task pane
 *   manifest.xml    the add-in manifest (copied from manifest/)
 *   assets/*.png    the icons (copied from assets/)
 *
 * `npm run build` (production, minified) or `npm start` / `npm run dev-server` (dev server on
 * port 3000: https with the Office development certificate where office-addin-dev-certs can
 * provide one, plain http otherwise, which Excel refuses to load: the server says so when it
 * starts; `npm start -- --env http` asks for plain http on purpose).
 *
 * One engine in the page: the task pane is built with `dependOn: 'functions'`, so taskpane.js
 * holds only the pane's own modules and uses the engine and the catalogue of
 * functions.js (loaded first by the page, which is the shared runtime).
 *
 * Build settings (`--env NAME=VALUE`):
 *   origin=https://addins.example.net/potentia  the address the add-in is served from: the
 *       manifest, every help link of functions.json and the pages are rewritten from the
 *       development address (default https://localhost:3000)
 *   officejs=local  serve Office.js from this add-in (copied from the @microsoft/office-js
 *       package into dist/office-js/, for offline or on-premises deployments); the page's
 *       script tag and Content-Security-Policy follow. Default: Office's CDN, as store
 *       add-ins require.
 */
const path = require('path');
const CustomFunctionsMetadataPlugin = require('custom-functions-metadata-plugin');
const HtmlWebpackPlugin = require('html-webpack-plugin');
const CopyWebpackPlugin = require('copy-webpack-plugin');
const { EagerModuleFactoriesPlugin } = require('./scripts/build/eagerModuleFactories');

const DEV_PORT = 3000;
/** The development address every URL of the sources is written with. */
const DEV_ORIGIN = `https://localhost:${DEV_PORT}`;
const OFFICE_JS_CDN = 'https://appsforoffice.microsoft.com/lib/1/hosted/office.js';
const OFFICE_JS_LOCAL = 'office-js/office.js';

/** The deployment address from `--env origin=…`: an https URL, no trailing slash. */
function originFrom(env) {
  const raw = env.origin === undefined || env.origin === true ? DEV_ORIGIN : String(env.origin);
  const origin = raw.replace(/\/+$/, '');
  let url;
  try {
    url = new (require('url').URL)(origin);
  } catch {
    throw new Error(
      `--env origin=${raw} is not a URL; give e.g. --env origin=https://addins.example.net/potentia`,
    );
  }
  if (url.protocol !== 'https:' || /["'<>\s]/.test(origin) || url.search || url.hash) {
    throw new Error(
      `--env origin=${raw} must be a plain https:// address (Office loads add-ins over https only)`,
    );
  }
  return origin;
}

/**
 * Rewrites the development address to the deployment address in every text file written
 * (manifest.xml, functions.json, the page and the bundles), after all plugins have emitted.
 */
class DeploymentOriginPlugin {
  constructor(origin) {
    this.origin = origin;
  }
  apply(compiler) {
    if (this.origin === DEV_ORIGIN) return;
    compiler.hooks.afterEmit.tapAsync('DeploymentOriginPlugin', (compilation, done) => {
      const fs = compiler.outputFileSystem;
      const out = compilation.outputOptions.path;
      const files = Object.keys(compilation.assets).filter((f) => /\.(xml|json|html|js)$/.test(f));
      let pending = files.length;
      if (pending === 0) return done();
      let failed = null;
      for (const f of files) {
        const file = path.join(out, f);
        fs.readFile(file, (err, data) => {
          if (err) failed = failed || err;
          const text = err ? '' : data.toString('utf8');
          const finish = (e) => {
            if (e) failed = failed || e;
            if (--pending === 0) done(failed);
          };
          if (err || !text.includes(DEV_ORIGIN)) return finish();
          fs.writeFile(file, text.split(DEV_ORIGIN).join(this.origin), finish);
        });
      }
    });
  }
}

/** Points the page at Office.js served from the add-in itself, and its policy with it. */
class LocalOfficeJsPlugin {
  apply(compiler) {
    compiler.hooks.compilation.tap('LocalOfficeJsPlugin', (compilation) => {
      HtmlWebpackPlugin.getHooks(compilation).beforeEmit.tap('LocalOfficeJsPlugin', (data) => {
        if (!data.html.includes(OFFICE_JS_CDN)) {
          throw new Error(
            `officejs=local: the page does not load ${OFFICE_JS_CDN}; update LocalOfficeJsPlugin`,
          );
        }
        data.html = data.html
          .split(OFFICE_JS_CDN)
          .join(OFFICE_JS_LOCAL)
          .replace(/(script-src 'self') https:\/\/appsforoffice\.microsoft\.com/g, '$1');
        return data;
      });
    });
  }
}
const FUNCTIONS_SOURCE = './src/functions/functions.ts';

/**
 * The metadata plugin also appends an unguarded `CustomFunctions.associate(...)` per function
 * to functions.ts through a loader. functions.ts associates its functions itself, guarded by
 * `typeof CustomFunctions !== 'undefined'` so that the page still loads outside Excel (for
 * example in a plain browser); this drops the plugin's loader so that each id is associated
 * once. The build contract test checks that every id of functions.json is associated.
 */
class KeepOwnAssociationsPlugin {
  apply(compiler) {
    const { NormalModule } = compiler.webpack;
    compiler.hooks.compilation.tap('KeepOwnAssociationsPlugin', (compilation) => {
      NormalModule.getCompilationHooks(compilation).beforeLoaders.tap(
        'KeepOwnAssociationsPlugin',
        (loaders) => {
          for (let i = loaders.length - 1; i >= 0; i--) {
            const loader = loaders[i] && loaders[i].loader;
            if (
              typeof loader === 'string' &&
              /custom-functions-metadata-plugin[\\/]lib[\\/]loader\.js$/.test(loader)
            ) {
              loaders.splice(i, 1);
            }
          }
        },
      );
    });
  }
}

/**
 * The page's Content-Security-Policy: scripts from this origin and Office's CDN only, no eval,
 * no requests to other hosts (the dev server's live-reload socket is same-origin).
 */
const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self' https://appsforoffice.microsoft.com",
  "style-src 'self'",
  "img-src 'self' data:",
  "font-src 'self'",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'none'",
].join('; ');

/**
 * Makes sure the page carries a Content-Security-Policy: where the template has none, puts
 * this one first in its <head>, before any script, so that it governs all of them
 * (html-webpack-plugin's `meta` option would place it after the template's own scripts).
 * A template's own policy is left as it is; test/build checks the built page's policy.
 */
class ContentSecurityPolicyPlugin {
  apply(compiler) {
    compiler.hooks.compilation.tap('ContentSecurityPolicyPlugin', (compilation) => {
      HtmlWebpackPlugin.getHooks(compilation).beforeEmit.tap('ContentSecurityPolicyPlugin', (data) => {
        if (/http-equiv=["']?Content-Security-Policy/i.test(data.html)) return data;
        const meta = `<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}">`;
        const withCharset = /<meta\s+charset=[^>]*>/i;
        data.html = withCharset.test(data.html)
          ? data.html.replace(withCharset, (m) => `${m}\n    ${meta}`)
          : data.html.replace(/<head(\s[^>]*)?>/i, (m) => `${m}\n    ${meta}`);
        return data;
      });
    });
  }
}

/** https options from the Office development certificate, or null (then the server runs on http). */
async function devServerHttpsOptions() {
  let devCerts;
  try {
    devCerts = require('office-addin-dev-certs');
  } catch {
    console.warn(
      '\n[potentia] office-addin-dev-certs is not installed: serving on http://localhost:3000.\n' +
        '           Excel loads add-ins only over https; run `npm install` and start again.\n',
    );
    return null;
  }
  try {
    return await devCerts.getHttpsServerOptions();
  } catch (err) {
    console.warn(
      '\n[potentia] Could not create or trust the development certificate ' +
        `(${err && err.message ? err.message : err}): serving on http://localhost:3000.\n` +
        '           Excel loads add-ins only over https; run `npx office-addin-dev-certs install` and start again.\n',
    );
    return null;
  }
}

module.exports = async (env = {}, argv = {}) => {
  const production = argv.mode !== 'development';
  const origin = originFrom(env);
  const officeJsLocal = env.officejs === 'local';
  if (env.officejs !== undefined && !officeJsLocal && env.officejs !== 'cdn') {
    throw new Error(`--env officejs=${env.officejs}: use officejs=local (or cdn, the default)`);
  }
  const serving = Boolean(env.WEBPACK_SERVE);
  // `npm start -- --env http` skips the certificate (a container, a browser-only check).
  const https = serving && !env.http ? await devServerHttpsOptions() : null;
  if (serving && env.http) {
    console.warn(
      '[potentia] Dev server on http://localhost:3000/ as asked; Excel needs https (README, "Install into Excel").',
    );
  }

  return {
    mode: production ? 'production' : 'development',
    devtool: production ? false : 'source-map',
    entry: {
      functions: FUNCTIONS_SOURCE,
      // Uses the modules of functions.js (the engine once in the page).
      taskpane: { import: './src/taskpane/taskpane.ts', dependOn: 'functions' },
    },
    output: {
      path: path.resolve(__dirname, 'dist'),
      filename: '[name].js',
      // Files are found next to the page: no run-time detection of the script's address
      // (functions.js also runs where there is no document, e.g. a JavaScript-only runtime).
      publicPath: '',
      clean: true,
    },
    resolve: { extensions: ['.ts', '.js'] },
    module: {
      rules: [
        {
          test: /\.ts$/,
          exclude: /node_modules/,
          use: {
            loader: 'ts-loader',
            options: {
              onlyCompileBundledFiles: true,
              // ES modules let webpack drop unused engine code; the type check is `npm run typecheck`.
              compilerOptions: { module: 'es2020', moduleResolution: 'bundler', sourceMap: !production },
              // the specs' documentation text stays out of the bundle (scripts/build/stripSpecDocs.js);
              // arrays of records are written as key lists and tuples (scripts/build/compactRecords.js)
              getCustomTransformers: () => ({
                before: [
                  require('./scripts/build/stripSpecDocs').stripSpecDocs,
                  require('./scripts/build/compactRecords').compactRecords,
                ],
              }),
            },
          },
        },
        { test: /\.css$/, type: 'asset/resource', generator: { filename: '[name][ext]' } },
      ],
    },
    optimization: {
      // webpack's default minifier settings (compress in two passes), and non-ASCII characters
      // written as \u escapes: an ASCII bundle loads as a one-byte string, half the memory and
      // no UTF-8 decoding (the text's ° and – are a few hundred characters)
      minimizeOptions: { javascript: { compress: { passes: 2 }, format: { asciiOnly: true } } },
    },
    performance: {
      // docs/design.md: the functions bundle stays under its budget, 230 KB minified (checked by test/build).
      hints: production ? 'warning' : false,
      maxEntrypointSize: 230 * 1024,
      maxAssetSize: 230 * 1024,
    },
    plugins: [
      new CustomFunctionsMetadataPlugin({ output: 'functions.json', input: FUNCTIONS_SOURCE }),
      new KeepOwnAssociationsPlugin(),
      new HtmlWebpackPlugin({
        filename: 'taskpane.html',
        template: './src/taskpane/taskpane.html',
        // Shared runtime: the same page hosts the task pane and the custom functions.
        chunks: ['functions', 'taskpane'],
        chunksSortMode: 'manual',
        scriptLoading: 'blocking',
        inject: 'body',
      }),
      new ContentSecurityPolicyPlugin(),
      ...(officeJsLocal ? [new LocalOfficeJsPlugin()] : []),
      new CopyWebpackPlugin({
        patterns: [
          { from: 'manifest/manifest.xml', to: 'manifest.xml' },
          { from: 'assets/icon-*.png', to: 'assets/[name][ext]' },
          ...(officeJsLocal
            ? [
                {
                  from: path.join(path.dirname(require.resolve('@microsoft/office-js/package.json')), 'dist'),
                  to: 'office-js',
                  globOptions: { ignore: ['**/*.debug.js'] },
                  info: { minimized: true },
                },
              ]
            : []),
        ],
      }),
      new DeploymentOriginPlugin(origin),
      // the module factories of functions.js compiled with the script (scripts/build/eagerModuleFactories.js)
      ...(production ? [new EagerModuleFactoriesPlugin(['functions.js'])] : []),
    ],
    devServer: {
      port: DEV_PORT,
      host: 'localhost',
      // Excel on the web fetches functions.json from its own origin.
      headers: { 'Access-Control-Allow-Origin': '*' },
      static: { directory: path.resolve(__dirname, 'dist') },
      server: https ? { type: 'https', options: https } : 'http',
      hot: false,
      liveReload: true,
      client: { overlay: { warnings: false, errors: true } },
    },
  };
};
