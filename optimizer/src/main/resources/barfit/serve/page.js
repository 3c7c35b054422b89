'use strict';
// The page of `barfit serve`: it talks only to the server that sent it (same origin, no other address).
(function () {
  const token = document.querySelector('meta[name="barfit-token"]').content;
  const tab = Math.random().toString(36).slice(2) + Date.now().toString(36);
  const $ = (id) => document.getElementById(id);
  const CONTROLS = ['max_depth', 'widths', 'fc', 'bar_sizes', 'costs', 'request'];
  let info = null;
  let item = null;
  let seq = 0;
  let pending = { explore: null, study: null };
  let timer = null;

  function el(tag, attrs, ...kids) {
    const e = document.createElement(tag);
    for (const [k, v] of Object.entries(attrs || {})) {
      if (v === null || v === undefined) continue;
      if (k === 'class') e.className = v; else e.setAttribute(k, v);
    }
    for (const k of kids) if (k !== null && k !== undefined) e.append(k instanceof Node ? k : String(k));
    return e;
  }

  function num(v, digits) {
    if (v === null || v === undefined || Number.isNaN(v)) return '—';
    const d = digits === undefined ? 2 : digits;
    return Number(v).toLocaleString('en-US', { minimumFractionDigits: 0, maximumFractionDigits: d });
  }

  function money(v) {
    if (v === null || v === undefined) return '—';
    return (info.currency ? info.currency + ' ' : '') + Number(v).toLocaleString('en-US',
      { minimumFractionDigits: 2, maximumFractionDigits: 2 });
  }

  function bars(group) {
    if (!group || !group.layers || group.layers.length === 0) return 'none';
    return group.layers.map((l) => l.count + ' No. ' + l.bar).join(' + ') + ' (' + group.face + ')';
  }

  function stirrups(s) {
    if (!s) return '—';
    const one = (z) => 'No. ' + z.bar + ' × ' + z.legs + ' legs @ ' + num(z.spacing, 1) + ' ' + info.length +
      (z.zone ? ' (' + z.zone + ')' : '');
    return Array.isArray(s) ? s.map(one).join('; ') : one(s);
  }

  // ---------- the controls ----------

  function fileControls() {
    const c = info.controls;
    return {
      max_depth: item.max_depth,
      widths: c.widths.join(', '),
      fc: c.fc,
      bar_sizes: c.bar_sizes.slice(),
      costs: Object.assign({}, c.costs),
    };
  }

  function fill(values) {
    const cap = values.max_depth;
    $('no-cap').checked = cap === null || cap === undefined;
    $('max_depth').value = $('no-cap').checked ? '' : cap;
    $('max_depth').disabled = $('no-cap').checked;
    $('cap-slider').value = $('no-cap').checked ? info.depth_max : cap;
    $('widths').value = values.widths;
    $('fc').value = values.fc;
    for (const box of document.querySelectorAll('#bar-choices input')) {
      box.checked = values.bar_sizes.includes(box.value);
    }
    for (const input of document.querySelectorAll('#cost-fields input')) {
      const v = values.costs[input.name];
      input.value = v === undefined ? '' : v;
    }
  }

  // The request: the item and every control that differs from the file.
  function request() {
    const file = fileControls();
    const body = {};
    body[item.kind] = item.id;
    const noCap = $('no-cap').checked;
    const capText = $('max_depth').value.trim();
    const cap = noCap ? null : (capText === '' ? null : Number(capText));
    if (noCap ? file.max_depth !== null : cap !== file.max_depth) body.max_depth = capText === '' && !noCap ? capText : cap;
    const widths = $('widths').value.trim();
    if (widths !== file.widths) {
      body.widths = widths === '' ? [] : widths.split(/[\s,;]+/).filter((w) => w !== '').map((w) => (isFinite(w) ? Number(w) : w));
    }
    const fc = $('fc').value.trim();
    if (fc === '' || Number(fc) !== file.fc) body.fc = fc === '' ? '' : Number(fc);
    const sizes = [...document.querySelectorAll('#bar-choices input:checked')].map((b) => b.value);
    if (sizes.join() !== file.bar_sizes.join()) body.bar_sizes = sizes;
    const costs = {};
    for (const input of document.querySelectorAll('#cost-fields input')) {
      const t = input.value.trim();
      if (t !== '' && Number(t) !== file.costs[input.name]) costs[input.name] = isFinite(t) ? Number(t) : t;
    }
    if (Object.keys(costs).length > 0) body.costs = costs;
    return body;
  }

  function clearErrors() {
    for (const k of CONTROLS) {
      $('err-' + k).textContent = '';
      const input = $(k);
      if (input && input.tagName === 'INPUT') input.removeAttribute('aria-invalid');
    }
  }

  function showErrors(errors) {
    for (const e of errors) {
      const where = CONTROLS.includes(e.control) ? e.control : 'request';
      $('err-' + where).textContent = e.message;
      const input = $(where);
      if (input && input.tagName === 'INPUT') input.setAttribute('aria-invalid', 'true');
    }
  }

  async function post(path, body, signal, extra) {
    const headers = Object.assign({
      'Content-Type': 'application/json',
      'X-Barfit-Tab': tab,
      'X-Barfit-Seq': String(seq),
    }, extra || {});
    const r = await fetch(path, { method: 'POST', headers, body: JSON.stringify(body), signal });
    return { status: r.status, body: await r.json() };
  }

  // ---------- solving ----------

  function changed() {
    clearTimeout(timer);
    timer = setTimeout(solve, 250);
  }

  async function solve() {
    if (!item) return;
    seq += 1;
    const mine = seq;
    for (const k of Object.keys(pending)) if (pending[k]) pending[k].abort();
    const body = request();
    location.replace('#' + encodeState(body));
    clearErrors();
    $('status').textContent = 'Solving ' + item.id + '…';
    $('status').className = 'working';
    $('study-status').textContent = '';
    document.body.dataset.state = 'working';
    const a = new AbortController();
    pending.explore = a;
    let r;
    try {
      r = await post('/api/explore', body, a.signal);
    } catch (e) {
      if (e.name !== 'AbortError') $('status').textContent = 'The server did not answer: ' + e.message;
      return;
    }
    if (mine !== seq) return;
    if (r.status === 409) return;
    if (r.status !== 200) {
      $('status').className = 'fail';
      $('status').textContent = 'Not solved: see the message beside the control.';
      if (r.body.errors) showErrors(r.body.errors); else showErrors([{ control: 'request', message: r.body.error }]);
      document.body.dataset.state = 'error';
      return;
    }
    renderDesign(r.body);
    document.body.dataset.state = 'designed';
    study(body, mine);
  }

  async function study(body, mine) {
    const a = new AbortController();
    pending.study = a;
    $('study-status').textContent = 'Sweeping the depth cap and comparing options…';
    $('study-status').className = 'working';
    let r;
    try {
      r = await post('/api/study', body, a.signal);
    } catch (e) {
      if (e.name !== 'AbortError') $('study-status').textContent = 'The server did not answer: ' + e.message;
      return;
    }
    if (mine !== seq || r.status === 409) return;
    $('study-status').className = '';
    if (r.status !== 200) {
      $('study-status').textContent = r.body.error || (r.body.errors && r.body.errors[0].message) || 'failed';
      return;
    }
    $('study-status').textContent = '';
    renderStudy(r.body);
    document.body.dataset.state = 'ready';
  }

  // ---------- rendering ----------

  function svgImage(svg, title) {
    const img = el('img', { alt: title, src: 'data:image/svg+xml;charset=utf-8,' + encodeURIComponent(svg) });
    return el('figure', {}, img, el('figcaption', {}, title));
  }

  function costTable(c) {
    const t = el('table', { class: 'cost' });
    t.append(el('tr', {}, el('th', {}, 'cost term'), el('th', { class: 'num' }, 'amount')));
    for (const k of ['concrete', 'main_bars', 'stirrups', 'formwork', 'depth_premium']) {
      if (c[k] !== undefined) t.append(el('tr', {}, el('td', {}, k.replace('_', ' ')), el('td', { class: 'num' }, money(c[k]))));
    }
    t.append(el('tr', {}, el('th', {}, 'total'), el('th', { class: 'num', 'data-cost': c.total }, money(c.total))));
    return t;
  }

  function renderBeam(b, basis) {
    const ok = b.status === 'optimal' || b.status === 'feasible';
    const box = el('div', { class: 'beam' + (ok ? '' : ' infeasible'), 'data-id': b.id,
      'data-width': b.width, 'data-height': b.height, 'data-cost': b.cost ? b.cost.total : '' });
    box.append(el('h3', {}, b.id + (b.line ? ' (' + b.line.id + ', ' + b.line.part + ')' : '') + ': ' + b.status));
    if (!ok) {
      const d = b.diagnosis || {};
      box.append(el('p', { class: 'fail' }, d.summary || 'no layout in the search space passes'));
      if (d.fixes) box.append(el('ul', {}, ...d.fixes.map((f) => el('li', {}, f))));
      return box;
    }
    box.append(el('p', { class: 'big' }, num(b.width, 1) + ' × ' + num(b.height, 1) + ' ' + info.length + ' — ' +
      money(b.cost.total) + ' ' + basis));
    const t = el('table', {});
    const row = (k, v) => t.append(el('tr', {}, el('th', {}, k), el('td', {}, v)));
    if (b.kind === 'span') {
      row('bottom bars', bars(b.bottom));
      row('top bars', b.top ? (b.top.continuous + ' No. ' + b.top.bar + ' continuous' +
        (b.top.left ? '; left ' + b.top.left.map((l) => l.count + ' No. ' + l.bar).join(' + ') : '') +
        (b.top.right ? '; right ' + b.top.right.map((l) => l.count + ' No. ' + l.bar).join(' + ') : '')) : '—');
      row('governing section', b.governing_section);
    } else {
      row('tension bars', bars(b.tension));
      row('compression bars', bars(b.compression));
    }
    row('stirrups', stirrups(b.stirrups));
    row('φMn / Mu', num(b.phi_Mn, 1) + ' / ' + num(Math.abs(b.Mu), 1) + ' ' + unitOf('moment') +
      '  (Mu/φMn ' + num(Math.abs(b.Mu) / b.phi_Mn, 3) + ')');
    row('εt', num(b.eps_t, 5) + (b.strain_class ? ' (' + b.strain_class + ')' : ''));
    if (b.binding && b.binding.length) {
      row('what binds', b.binding.map((x) => x.check + (x.when ? ' — ' + x.when : '')).join('; '));
    }
    const p = b.proof;
    if (p) {
      row('proof', p.solver + ' ' + p.status + ': cost ' + num(p.objective, 4) + ', bound ' + num(p.bound, 4) +
        ', gap ' + num(p.gap, 6) + ' (' + p.basis + ', ' + p.workers + ' worker, seed ' + p.seed + ')');
    }
    if (b.carbon) {
      row('embodied carbon', num(b.carbon.total, 1) + ' ' + (info.units === 'US' ? 'lb' : 'kg') + ' CO2e ' + basis +
        ' (concrete ' + num(b.carbon.concrete, 1) + ', main bars ' + num(b.carbon.main_bars, 1) + ', stirrups ' +
        num(b.carbon.stirrups, 1) + '; stages A1-A3)');
    }
    box.append(t, costTable(b.cost));
    if (b.alternatives && b.alternatives.length) {
      const at = el('table', { class: 'alternatives' });
      at.append(el('tr', {}, el('th', {}, 'next cheapest'), el('th', {}, 'section'), el('th', { class: 'num' }, 'cost')));
      b.alternatives.forEach((a, i) => at.append(el('tr', {},
        el('td', {}, String(i + 1)),
        el('td', {}, num(a.width, 1) + ' × ' + num(a.height, 1) + (a.tension ? '; ' + bars(a.tension) : '') +
          (a.bottom ? '; bottom ' + bars(a.bottom) : '')),
        el('td', { class: 'num' }, money(a.cost.total)))));
      box.append(at);
    }
    return box;
  }

  function unitOf(kind) {
    return info.unit_labels ? info.unit_labels[kind] : '';
  }

  function renderDesign(r) {
    const d = r.design;
    info.unit_labels = d.unit_labels;
    const out = $('design');
    out.replaceChildren();
    let ok = true;
    for (const b of d.beams) {
      ok = ok && (b.status === 'optimal' || b.status === 'feasible');
      const perBeam = b.cost_per_length && b.cost && Math.abs(b.cost_per_length.total - b.cost.total) > 1e-9;
      out.append(renderBeam(b, b.kind === 'span' ? 'per span' : perBeam ? 'per beam' : 'per ' + (info.units === 'US' ? 'ft' : 'm')));
    }
    for (const l of d.lines || []) {
      out.prepend(el('p', { class: 'big', 'data-line': l.id }, 'Line ' + l.id + ': ' + l.status +
        (l.width ? ', ' + num(l.width, 1) + ' × ' + num(l.height, 1) + ' ' + info.length : ', sections per span') +
        (l.cost !== undefined ? ', ' + money(l.cost.total !== undefined ? l.cost.total : l.cost) : '')));
    }
    $('status').className = ok ? 'ok' : 'fail';
    $('status').textContent = item.id + ': ' + (ok ? 'designed, proven cheapest in the search space' : 'no passing layout');
    const dr = $('drawings');
    dr.replaceChildren();
    for (const g of r.drawings) dr.append(svgImage(g.svg, g.title));
  }

  function renderStudy(r) {
    const c = $('curve');
    c.replaceChildren();
    for (const p of r.plots) c.append(svgImage(p.svg, 'cost against depth cap: ' + p.title));
    const cmp = $('compare');
    cmp.replaceChildren(el('h2', {}, 'Options compared'));
    for (const b of r.compare.beams) {
      const t = el('table', { class: 'compare' });
      t.append(el('tr', {}, el('th', {}, 'option'), el('th', {}, 'section'), el('th', {}, 'bars'),
        el('th', { class: 'num' }, 'cost (' + b.cost_basis + ')')));
      for (const o of b.options) {
        t.append(el('tr', {},
          el('td', {}, o.label),
          el('td', {}, o.feasible ? num(o.width, 1) + ' × ' + num(o.height, 1) : 'no design'),
          el('td', {}, o.description || o.note || ''),
          el('td', { class: 'num' }, o.feasible ? money(o.cost.total) : '—')));
      }
      cmp.append(el('h3', {}, b.id), t);
    }
  }

  // ---------- state in the address (so a view can be shared or reloaded) ----------

  function encodeState(body) {
    const p = new URLSearchParams();
    for (const [k, v] of Object.entries(body)) p.set(k, JSON.stringify(v));
    return p.toString();
  }

  function decodeState() {
    const p = new URLSearchParams(location.hash.slice(1));
    const out = {};
    for (const [k, v] of p.entries()) {
      try { out[k] = JSON.parse(v); } catch (e) { out[k] = v; }
    }
    return out;
  }

  function choose(it, state) {
    item = it;
    for (const b of document.querySelectorAll('#items button')) {
      b.setAttribute('aria-current', String(b.dataset.id === it.id && b.dataset.kind === it.kind));
    }
    $('which').textContent = '— ' + it.id;
    const values = fileControls();
    if (state) {
      if ('max_depth' in state) values.max_depth = state.max_depth;
      if (state.widths) values.widths = state.widths.join(', ');
      if ('fc' in state) values.fc = state.fc;
      if (state.bar_sizes) values.bar_sizes = state.bar_sizes;
      if (state.costs) Object.assign(values.costs, state.costs);
    }
    fill(values);
    $('kept').textContent = '';
    solve();
  }

  async function keep() {
    const r = await post('/api/keep', request(), undefined, { 'X-Barfit-Token': token });
    if (r.status === 200) {
      $('kept').textContent = 'Written to ' + r.body.written;
    } else {
      $('kept').textContent = '';
      if (r.body.errors) showErrors(r.body.errors); else showErrors([{ control: 'request', message: r.body.error }]);
    }
  }

  async function start() {
    const r = await fetch('/api/items');
    info = await r.json();
    for (const s of document.querySelectorAll('.u-length')) s.textContent = info.length;
    for (const s of document.querySelectorAll('.u-stress')) s.textContent = info.stress;
    const slider = $('cap-slider');
    slider.min = info.depth_min;
    slider.max = info.depth_max;
    slider.step = 'any';
    const list = $('items');
    for (const it of info.items) {
      const b = el('button', { type: 'button', 'data-id': it.id, 'data-kind': it.kind },
        it.id, el('span', { class: 'kind' }, it.kind === 'line' ? 'line' : it.whole ? 'span' : 'section'));
      b.addEventListener('click', () => choose(it));
      list.append(el('li', {}, b));
    }
    const choices = $('bar-choices');
    for (const d of info.bar_choices) {
      choices.append(el('label', {}, el('input', { type: 'checkbox', value: d }), ' ' + d));
    }
    const costs = $('cost-fields');
    for (const k of info.cost_keys) {
      const id = 'cost-' + k;
      costs.append(el('label', { for: id }, k.replaceAll('_', ' '),
        el('input', { id, name: k, type: 'number', step: 'any', placeholder: 'default' })));
    }
    slider.addEventListener('input', () => {
      $('no-cap').checked = false;
      $('max_depth').disabled = false;
      $('max_depth').value = slider.value;
      changed();
    });
    $('max_depth').addEventListener('input', () => {
      if ($('max_depth').value !== '') slider.value = $('max_depth').value;
      changed();
    });
    $('no-cap').addEventListener('change', () => {
      $('max_depth').disabled = $('no-cap').checked;
      changed();
    });
    for (const id of ['widths', 'fc']) $(id).addEventListener('input', changed);
    choices.addEventListener('change', changed);
    costs.addEventListener('input', changed);
    $('reset').addEventListener('click', () => { fill(fileControls()); solve(); });
    $('keep').addEventListener('click', keep);
    $('controls').addEventListener('submit', (e) => { e.preventDefault(); solve(); });
    const state = decodeState();
    const first = info.items.find((it) => (state.beam && it.kind === 'beam' && it.id === state.beam) ||
      (state.line && it.kind === 'line' && it.id === state.line)) || info.items[0];
    if (first) choose(first, first.id === (state.beam || state.line) ? state : null);
  }

  start();
})();
