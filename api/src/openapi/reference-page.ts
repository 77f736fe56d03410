/**
 * The interactive API reference: a small page and a script of our own that read
 * /api/v1/openapi.json, list every operation with its parameters, schemas and access, and send
 * requests from the browser ("try it") with an optional API key or access token.
 */

export const REFERENCE_PAGE_HTML = `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Kelvindex API reference</title>
<style>
  :root { color-scheme: light dark; --fg: #1d2430; --muted: #5b6575; --bg: #ffffff; --panel: #f3f5f8; --line: #d9dee6; --accent: #0b6e69; }
  @media (prefers-color-scheme: dark) { :root { --fg: #e4e8ee; --muted: #9aa4b2; --bg: #14181e; --panel: #1c222a; --line: #2e3742; --accent: #4fc1b8; } }
  * { box-sizing: border-box; }
  body { margin: 0; font: 15px/1.5 system-ui, sans-serif; color: var(--fg); background: var(--bg); }
  header { padding: 16px 24px; border-bottom: 1px solid var(--line); display: flex; gap: 24px; align-items: center; flex-wrap: wrap; }
  header h1 { font-size: 20px; margin: 0; }
  header .auth { margin-left: auto; display: flex; gap: 8px; align-items: center; }
  input, select, textarea, button { font: inherit; color: inherit; background: var(--bg); border: 1px solid var(--line); border-radius: 4px; padding: 4px 8px; }
  button { cursor: pointer; background: var(--accent); color: var(--bg); border-color: var(--accent); }
  main { display: grid; grid-template-columns: 280px 1fr; min-height: calc(100vh - 64px); }
  nav { border-right: 1px solid var(--line); padding: 12px; overflow: auto; max-height: calc(100vh - 64px); position: sticky; top: 0; }
  nav h2 { font-size: 13px; text-transform: uppercase; letter-spacing: .05em; color: var(--muted); margin: 16px 0 4px; }
  nav a { display: block; color: inherit; text-decoration: none; padding: 2px 4px; border-radius: 3px; font-size: 13px; }
  nav a:hover { background: var(--panel); }
  #content { padding: 16px 24px; overflow: auto; }
  .op { border: 1px solid var(--line); border-radius: 6px; margin: 0 0 16px; }
  .op > h3 { margin: 0; padding: 8px 12px; background: var(--panel); font-size: 15px; display: flex; gap: 12px; align-items: baseline; }
  .op .body { padding: 8px 12px; }
  .method { font: 600 12px ui-monospace, monospace; text-transform: uppercase; padding: 2px 6px; border-radius: 3px; background: var(--accent); color: var(--bg); }
  .path { font-family: ui-monospace, monospace; }
  .access { margin-left: auto; font-size: 12px; color: var(--muted); }
  table { border-collapse: collapse; width: 100%; margin: 8px 0; font-size: 13px; }
  th, td { text-align: left; border-bottom: 1px solid var(--line); padding: 4px 6px; vertical-align: top; }
  code, pre { font-family: ui-monospace, monospace; font-size: 13px; }
  pre { background: var(--panel); padding: 8px; border-radius: 4px; overflow: auto; max-height: 480px; white-space: pre-wrap; }
  .muted { color: var(--muted); }
  .try label { display: block; margin: 4px 0; }
  .try input { width: 60%; }
  .try textarea { width: 100%; min-height: 120px; font-family: ui-monospace, monospace; }
  details > summary { cursor: pointer; color: var(--accent); }
</style>
</head>
<body>
<header>
  <h1>Kelvindex API reference</h1>
  <span id="version" class="muted"></span>
  <div class="auth">
    <label for="credential">API key or access token</label>
    <input id="credential" type="password" autocomplete="off" placeholder="optional">
  </div>
</header>
<main>
  <nav id="nav" aria-label="Operations"></nav>
  <div id="content"><p class="muted">Loading the OpenAPI document…</p></div>
</main>
<script src="/api/v1/docs/reference.js" defer></script>
</body>
</html>
`;

export const REFERENCE_PAGE_SCRIPT = String.raw`(function () {
  'use strict';
  var API = '/api/v1';
  var doc;

  function el(tag, attrs, children) {
    var node = document.createElement(tag);
    Object.keys(attrs || {}).forEach(function (key) {
      if (key === 'text') node.textContent = attrs[key];
      else if (key === 'className') node.className = attrs[key];
      else node.setAttribute(key, attrs[key]);
    });
    (children || []).forEach(function (child) {
      if (child === null || child === undefined) return;
      node.appendChild(typeof child === 'string' ? document.createTextNode(child) : child);
    });
    return node;
  }

  /** Text with backtick code spans and **bold**, as DOM nodes (never innerHTML). */
  function rich(text) {
    var out = el('p');
    String(text || '').split(/(\x60[^\x60]+\x60|\*\*[^*]+\*\*)/).forEach(function (part) {
      if (/^\x60.*\x60$/.test(part)) out.appendChild(el('code', { text: part.slice(1, -1) }));
      else if (/^\*\*.*\*\*$/.test(part)) out.appendChild(el('strong', { text: part.slice(2, -2) }));
      else if (part) out.appendChild(document.createTextNode(part));
    });
    return out;
  }

  function resolve(schema) {
    var seen = 0;
    while (schema && schema.$ref && seen++ < 20) {
      var name = schema.$ref.split('/').pop();
      schema = doc.components.schemas[name] || (doc.components.parameters || {})[name];
    }
    return schema || {};
  }

  function typeOf(schema) {
    if (!schema) return '';
    if (schema.$ref) return schema.$ref.split('/').pop();
    if (schema.enum) return schema.enum.map(function (v) { return JSON.stringify(v); }).join(' | ');
    if (schema.const !== undefined) return JSON.stringify(schema.const);
    if (schema.anyOf || schema.oneOf) return (schema.anyOf || schema.oneOf).map(typeOf).join(' | ');
    var type = Array.isArray(schema.type) ? schema.type.join(' | ') : schema.type || 'any';
    if (type === 'array') return typeOf(schema.items) + '[]';
    return type + (schema.format ? ' (' + schema.format + ')' : '');
  }

  function example(schema, depth) {
    schema = resolve(schema);
    if (depth > 4) return null;
    if (schema.const !== undefined) return schema.const;
    if (schema.enum) return schema.enum[0];
    if (schema.anyOf || schema.oneOf) return example((schema.anyOf || schema.oneOf)[0], depth + 1);
    var type = Array.isArray(schema.type) ? schema.type[0] : schema.type;
    if (type === 'object' || schema.properties) {
      var out = {};
      Object.keys(schema.properties || {}).forEach(function (key) {
        if ((schema.required || []).indexOf(key) >= 0) out[key] = example(schema.properties[key], depth + 1);
      });
      return out;
    }
    if (type === 'array') return [example(schema.items, depth + 1)];
    if (type === 'number' || type === 'integer') return 0;
    if (type === 'boolean') return false;
    return '';
  }

  function schemaTable(schema) {
    schema = resolve(schema);
    if (!schema.properties) return el('p', { className: 'muted', text: typeOf(schema) });
    var rows = Object.keys(schema.properties).map(function (key) {
      var property = schema.properties[key];
      var required = (schema.required || []).indexOf(key) >= 0;
      return el('tr', {}, [el('td', {}, [el('code', { text: key + (required ? '' : '?') })]), el('td', { text: typeOf(property) }), el('td', { text: resolve(property).description || '' })]);
    });
    return el('table', {}, [el('thead', {}, [el('tr', {}, [el('th', { text: 'property' }), el('th', { text: 'type' }), el('th', { text: 'description' })])]), el('tbody', {}, rows)]);
  }

  function accessText(operation) {
    var access = operation['x-kelvindex-access'];
    if (!access) return '';
    return 'access: ' + (Array.isArray(access) ? access.join(' or ') : access);
  }

  function credentialHeaders() {
    var value = document.getElementById('credential').value.trim();
    if (!value) return {};
    return /^kx[A-Za-z0-9]{10}\./.test(value) ? { 'X-API-Key': value } : { Authorization: 'Bearer ' + value };
  }

  function tryIt(path, method, operation) {
    var form = el('form', { className: 'try' });
    var parameters = (operation.parameters || []).map(resolve);
    parameters.forEach(function (parameter) {
      form.appendChild(el('label', {}, [el('code', { text: parameter.name }), ' (' + parameter.in + ') ', el('input', { name: parameter.name, 'data-in': parameter.in })]));
    });
    var body = null;
    var jsonBody = operation.requestBody && operation.requestBody.content['application/json'];
    if (jsonBody) {
      body = el('textarea', { name: '__body' });
      body.value = JSON.stringify(example(jsonBody.schema, 0), null, 2);
      form.appendChild(body);
    } else if (operation.requestBody) {
      form.appendChild(el('p', { className: 'muted', text: 'This operation takes a file upload (multipart/form-data): send it with curl or a script.' }));
    }
    var output = el('pre', { className: 'muted', text: '' });
    form.appendChild(el('button', { type: 'submit', text: 'Send' }));
    form.appendChild(output);
    form.addEventListener('submit', function (event) {
      event.preventDefault();
      var url = path;
      var query = new URLSearchParams();
      Array.prototype.forEach.call(form.querySelectorAll('input[data-in]'), function (input) {
        if (!input.value) return;
        if (input.getAttribute('data-in') === 'path') url = url.replace('{' + input.name + '}', encodeURIComponent(input.value));
        else if (input.getAttribute('data-in') === 'query') query.append(input.name, input.value);
      });
      var headers = credentialHeaders();
      var init = { method: method.toUpperCase(), headers: headers };
      if (body) {
        headers['Content-Type'] = 'application/json';
        init.body = body.value;
      }
      var full = API + url + (query.toString() ? '?' + query.toString() : '');
      output.textContent = init.method + ' ' + full + '\n…';
      fetch(full, init).then(function (response) {
        return response.text().then(function (text) {
          var shown = text;
          try { shown = JSON.stringify(JSON.parse(text), null, 2); } catch (e) { /* not JSON */ }
          if (shown.length > 100000) shown = shown.slice(0, 100000) + '\n… (cut at 100 000 characters)';
          var meta = ['ETag', 'Cache-Control', 'Content-Type'].map(function (h) { return response.headers.get(h) ? h + ': ' + response.headers.get(h) : null; }).filter(Boolean);
          output.textContent = init.method + ' ' + full + '\n' + response.status + ' ' + response.statusText + '\n' + meta.join('\n') + '\n\n' + shown;
        });
      }).catch(function (error) { output.textContent = String(error); });
    });
    return el('details', {}, [el('summary', { text: 'Try it' }), form]);
  }

  function operationCard(path, method, operation, id) {
    var body = el('div', { className: 'body' });
    if (operation.description) body.appendChild(rich(operation.description));
    var parameters = (operation.parameters || []).map(resolve);
    if (parameters.length) {
      body.appendChild(el('h4', { text: 'Parameters' }));
      body.appendChild(el('table', {}, [
        el('thead', {}, [el('tr', {}, [el('th', { text: 'name' }), el('th', { text: 'in' }), el('th', { text: 'type' }), el('th', { text: 'description' })])]),
        el('tbody', {}, parameters.map(function (p) {
          return el('tr', {}, [el('td', {}, [el('code', { text: p.name + (p.required ? '' : '?') })]), el('td', { text: p.in }), el('td', { text: typeOf(p.schema) }), el('td', { text: p.description || '' })]);
        })),
      ]));
    }
    if (operation.requestBody) {
      var mediaType = Object.keys(operation.requestBody.content)[0];
      body.appendChild(el('h4', { text: 'Request body (' + mediaType + ')' }));
      body.appendChild(schemaTable(operation.requestBody.content[mediaType].schema));
    }
    body.appendChild(el('h4', { text: 'Responses' }));
    body.appendChild(el('table', {}, [el('tbody', {}, Object.keys(operation.responses || {}).map(function (status) {
      var response = operation.responses[status];
      var content = response.content || {};
      var types = Object.keys(content).map(function (type) { return type + (content[type].schema ? ': ' + typeOf(content[type].schema) : ''); });
      return el('tr', {}, [el('td', {}, [el('code', { text: status })]), el('td', { text: response.description || '' }), el('td', { text: types.join('; ') })]);
    }))]));
    body.appendChild(tryIt(path, method, operation));
    return el('section', { className: 'op', id: id }, [
      el('h3', {}, [el('span', { className: 'method', text: method }), el('span', { className: 'path', text: path }), el('span', { text: operation.summary || '' }), el('span', { className: 'access', text: accessText(operation) })]),
      body,
    ]);
  }

  function render() {
    document.getElementById('version').textContent = 'version ' + doc.info.version + ' · OpenAPI ' + doc.openapi;
    var content = document.getElementById('content');
    var nav = document.getElementById('nav');
    content.textContent = '';
    nav.textContent = '';
    var intro = el('section');
    String(doc.info.description || '').split(/\n\n+/).forEach(function (paragraph) { intro.appendChild(rich(paragraph.replace(/\n/g, ' '))); });
    content.appendChild(intro);
    var byTag = {};
    Object.keys(doc.paths).forEach(function (path) {
      Object.keys(doc.paths[path]).forEach(function (method) {
        var operation = doc.paths[path][method];
        var tag = (operation.tags || ['Other'])[0];
        (byTag[tag] = byTag[tag] || []).push({ path: path, method: method, operation: operation });
      });
    });
    var order = (doc.tags || []).map(function (t) { return t.name; });
    Object.keys(byTag).sort(function (a, b) {
      var ia = order.indexOf(a), ib = order.indexOf(b);
      return (ia < 0 ? 99 : ia) - (ib < 0 ? 99 : ib) || (a < b ? -1 : 1);
    }).forEach(function (tag) {
      nav.appendChild(el('h2', { text: tag }));
      content.appendChild(el('h2', { text: tag }));
      byTag[tag].forEach(function (entry, i) {
        var id = (tag + '-' + i).replace(/[^A-Za-z0-9-]/g, '-');
        nav.appendChild(el('a', { href: '#' + id, text: entry.method.toUpperCase() + ' ' + entry.path }));
        content.appendChild(operationCard(entry.path, entry.method, entry.operation, id));
      });
    });
    nav.appendChild(el('h2', { text: 'Schemas' }));
    content.appendChild(el('h2', { text: 'Schemas' }));
    Object.keys(doc.components.schemas).sort().forEach(function (name) {
      nav.appendChild(el('a', { href: '#schema-' + name, text: name }));
      var schema = doc.components.schemas[name];
      content.appendChild(el('section', { className: 'op', id: 'schema-' + name }, [
        el('h3', {}, [el('span', { className: 'path', text: name })]),
        el('div', { className: 'body' }, [schema.description ? rich(schema.description) : null, schemaTable(schema)]),
      ]));
    });
  }

  var stored = sessionStorage.getItem('kelvindex-credential');
  var credential = document.getElementById('credential');
  if (stored) credential.value = stored;
  credential.addEventListener('change', function () { sessionStorage.setItem('kelvindex-credential', credential.value); });

  fetch(API + '/openapi.json').then(function (r) { return r.json(); }).then(function (d) { doc = d; render(); }).catch(function (error) {
    document.getElementById('content').textContent = 'Could not load the OpenAPI document: ' + error;
  });
})();
`;
