// Screening pages. (1) Live results: the form is posted to the server's preview endpoint as it is filled in, and the
// results panel is refilled from the JSON answer. The server computes everything; this file only moves text into
// the page (textContent, never HTML). Without JavaScript the "Calculate" button does the same with a page load.
// (2) Trend charts on the patient page, drawn from the accessible tables that hold the same numbers.
(() => {
  'use strict';

  const el = (tag, className, text) => {
    const node = document.createElement(tag);
    if (className) node.className = className;
    if (text !== undefined && text !== null) node.textContent = text;
    return node;
  };

  function livePreview(form) {
    const url = form.getAttribute('data-preview-url');
    const panel = document.getElementById('findings');
    if (!url || !panel) return;
    const csrf = form.querySelector('input[name="_csrf"]');
    let timer = null;
    let sequence = 0;

    const showFieldErrors = (errors) => {
      form.querySelectorAll('.cell').forEach((cell) => {
        const input = cell.querySelector('input, select');
        const message = cell.querySelector('.error');
        if (!input || !message) return;
        const key = input.id.substring(2);
        const text = errors[key];
        cell.classList.toggle('has-error', Boolean(text));
        message.textContent = text || '';
      });
    };

    const fillList = (list, items, render, emptyText) => {
      list.replaceChildren();
      if (items.length === 0) {
        list.appendChild(el('li', 'muted', emptyText));
        return;
      }
      items.forEach((item) => list.appendChild(render(item)));
    };

    const render = (data) => {
      const rules = document.getElementById('findings-rules');
      rules.textContent = data.rulesLabel;
      rules.setAttribute('href', rules.getAttribute('href').replace(/\d+$/, String(data.rulesVersion)));
      data.bands.forEach((band) => {
        const target = document.getElementById('suggested-' + band.region);
        if (!target) return;
        target.textContent = band.bandLabel;
        target.setAttribute('data-band', band.band);
        if (target.nextElementSibling) target.nextElementSibling.textContent = band.basis;
      });
      fillList(document.getElementById('findings-list'), data.findings, (f) => {
        const li = el('li', 'finding');
        li.appendChild(el('strong', null, f.label));
        li.appendChild(document.createTextNode(' ' + f.line + ' '));
        li.appendChild(el('span', 'source', f.source));
        li.appendChild(document.createTextNode(' '));
        li.appendChild(el('span', 'badge', f.evidence));
        return li;
      }, panel.getAttribute('data-none'));
      fillList(document.getElementById('findings-missing'), data.missing, (m) => el('li', null, m),
        panel.getAttribute('data-complete'));
      const derived = document.querySelector('#findings-derived tbody');
      derived.replaceChildren();
      if (data.derived.length === 0) {
        const row = el('tr');
        const cell = el('td', 'muted', panel.getAttribute('data-derived-none'));
        cell.colSpan = 2;
        row.appendChild(cell);
        derived.appendChild(row);
      }
      data.derived.forEach((d) => {
        const row = el('tr');
        row.setAttribute('data-key', d.key);
        const head = el('th');
        head.scope = 'row';
        head.appendChild(el('span', null, d.label));
        head.appendChild(document.createTextNode(' '));
        head.appendChild(el('span', 'source', d.source));
        row.appendChild(head);
        row.appendChild(d.value !== null
          ? el('td', 'num', d.value)
          : el('td', 'not-scorable', panel.getAttribute('data-not-scorable') + ': ' + d.notScorable));
        derived.appendChild(row);
      });
      const changes = document.querySelector('#findings-changes tbody');
      if (changes) {
        changes.replaceChildren();
        data.changes.forEach((c) => {
          const row = el('tr');
          const head = el('th', null, c.label);
          head.scope = 'row';
          row.appendChild(head);
          [c.previous, c.current, c.improvement].forEach((v) => row.appendChild(el('td', 'num', v === null ? '–' : v)));
          const mcid = el('td');
          mcid.appendChild(el('span', null, c.mcid));
          mcid.appendChild(document.createTextNode(' '));
          mcid.appendChild(el('span', 'source', c.source));
          row.appendChild(mcid);
          row.appendChild(el('td', null, c.verdict));
          changes.appendChild(row);
        });
      }
    };

    const refresh = () => {
      const mine = ++sequence;
      const body = new URLSearchParams(new FormData(form));
      body.delete('action');
      const headers = { 'Content-Type': 'application/x-www-form-urlencoded', Accept: 'application/json' };
      if (csrf) headers['X-CSRF-TOKEN'] = csrf.value;
      panel.setAttribute('aria-busy', 'true');
      fetch(url, { method: 'POST', body, headers, credentials: 'same-origin' })
        .then((response) => (response.ok ? response.json() : Promise.reject(response.status)))
        .then((data) => {
          if (mine !== sequence) return; // an older answer arriving late must not overwrite a newer one
          const errors = data.fieldErrors || {};
          showFieldErrors(errors);
          if (Object.keys(errors).length === 0) render(data);
        })
        .catch(() => { /* the Calculate button still works */ })
        .finally(() => { if (mine === sequence) panel.removeAttribute('aria-busy'); });
    };

    const schedule = () => {
      window.clearTimeout(timer);
      timer = window.setTimeout(refresh, 350);
    };
    form.addEventListener('input', schedule);
    form.addEventListener('change', schedule);
  }

  function trendCharts() {
    if (typeof window.Chart !== 'function') return;
    document.querySelectorAll('table[data-chart]').forEach((table) => {
      const labels = Array.from(table.querySelectorAll('thead th[data-label]')).map((th) => th.getAttribute('data-label'));
      const datasets = Array.from(table.querySelectorAll('tbody tr')).map((row) => ({
        label: row.querySelector('th').textContent.trim(),
        data: Array.from(row.querySelectorAll('td')).map((td) => {
          const v = td.getAttribute('data-value');
          return v === null || v === '' ? null : Number(v);
        }),
        spanGaps: true,
      }));
      const box = el('div', 'chart-box');
      const canvas = el('canvas');
      canvas.setAttribute('role', 'img');
      canvas.setAttribute('aria-label', table.querySelector('caption') ? table.querySelector('caption').textContent : '');
      box.appendChild(canvas);
      table.parentNode.insertBefore(box, table);
      // eslint-disable-next-line no-new
      new window.Chart(canvas, {
        type: 'line',
        data: { labels, datasets },
        options: { responsive: true, maintainAspectRatio: false, animation: false,
          plugins: { legend: { position: 'bottom' } } },
      });
    });
  }

  document.addEventListener('DOMContentLoaded', () => {
    const form = document.getElementById('screening-form');
    if (form) livePreview(form);
    trendCharts();
  });
})();
