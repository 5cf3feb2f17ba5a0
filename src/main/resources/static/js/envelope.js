// Envelope page: draws the two demand charts from the server's data and keeps them, and the what-if numbers, in
// step with the what-if controls. Every number comes from the server (the engine); nothing is computed here.
document.addEventListener('DOMContentLoaded', () => {
  const source = document.getElementById('envelope-data');
  const form = document.querySelector('form.what-if-form');
  if (!source || !form || typeof Chart === 'undefined') {
    return;
  }
  const data = JSON.parse(source.textContent);
  const labels = data.labels;
  const byId = (id) => document.getElementById(id);
  const format = (value, decimals, unit) => (value === null || value === undefined)
    ? '–' : value.toFixed(decimals) + (unit ? ' ' + unit : '');

  // Axis labels with at most two decimals (the axis ends are data values such as 22.000000000000004 cm).
  const tick = (value) => String(Math.round(value * 100) / 100);
  const chart = (canvasId, xTitle) => new Chart(byId(canvasId), {
    type: 'line',
    data: {
      datasets: [
        { label: labels.demand, data: [], borderColor: '#2f5d7c', backgroundColor: '#2f5d7c', pointRadius: 0,
          borderWidth: 2, spanGaps: false },
        { label: labels.permittedLine, data: [], borderColor: '#9b1c1c', borderDash: [6, 4], pointRadius: 0,
          borderWidth: 1.5 },
        { label: labels.chosen, data: [], type: 'scatter', borderColor: '#1f2a33', backgroundColor: '#f5b700',
          pointRadius: 7, pointStyle: 'rectRot', clip: false },
      ],
    },
    options: {
      animation: false,
      maintainAspectRatio: false,
      parsing: false,
      scales: {
        x: { type: 'linear', title: { display: true, text: xTitle }, ticks: { callback: tick } },
        y: { type: 'linear', min: 0, title: { display: true, text: labels.demandAxis }, ticks: { callback: tick } },
      },
      plugins: { legend: { position: 'bottom' } },
    },
  });
  const gripChart = chart('chart-grip', labels.gripAxis);
  const cycleChart = chart('chart-cycle', labels.cycleAxis);

  const draw = (target, series, chosenX, chosenD, decimals, tableId) => {
    const points = series.map((p) => ({ x: p.x, y: p.d }));
    const xs = series.map((p) => p.x);
    const finite = series.map((p) => p.d).filter((d) => d !== null);
    // Keep the permitted line in view: the axis grows with the demand up to 6 × the allowance, then clips.
    const top = Math.ceil(Math.min(Math.max(1.5, ...finite, chosenD || 0) * 1.05, 6) * 2) / 2;
    target.data.datasets[0].data = points;
    target.data.datasets[1].data = xs.length ? [{ x: Math.min(...xs), y: 1 }, { x: Math.max(...xs), y: 1 }] : [];
    target.data.datasets[2].data = chosenD === null ? [] : [{ x: chosenX, y: chosenD }];
    target.options.scales.y.max = top;
    target.options.scales.x.min = xs.length ? Math.min(...xs) : undefined;
    target.options.scales.x.max = xs.length ? Math.max(...xs) : undefined;
    target.update();
    const body = byId(tableId).querySelector('tbody');
    body.replaceChildren(...series.map((p) => {
      const row = document.createElement('tr');
      const x = document.createElement('td');
      x.textContent = p.x.toFixed(decimals);
      const d = document.createElement('td');
      d.className = 'num';
      d.textContent = format(p.d, 2, '');
      row.append(x, d);
      return row;
    }));
  };

  const show = (w) => {
    byId('whatif-verdict').textContent = w.verdictLabel || '–';
    byId('whatif-demand').textContent = format(w.demandRatio, 2, '');
    byId('whatif-binding').textContent = w.bindingLabel || '–';
    byId('load-torque').textContent = format(w.peakShoulderTorqueNm, 1, 'N·m');
    byId('load-torque-allowance').textContent = format(w.shoulderAllowanceNm, 1, 'N·m');
    byId('load-torque-ratio').textContent = format(w.shoulderTorqueRatio, 2, '');
    byId('load-hold').textContent = format(w.holdTorqueNm, 1, 'N·m');
    byId('load-hold-allowance').textContent = format(w.shoulderAllowanceNm, 1, 'N·m');
    byId('load-hold-ratio').textContent = format(w.holdTorqueRatio, 2, '');
    byId('load-grip').textContent = format(w.peakGripPullN, 0, 'N');
    byId('load-grip-allowance').textContent = format(w.gripAllowanceN, 0, 'N');
    byId('load-grip-ratio').textContent = format(w.gripPullRatio, 2, '');
    byId('load-wrist').textContent = format(w.peakWristMomentNm, 1, 'N·m');
    byId('load-moment-arm').textContent = format(w.momentArmCm, 1, 'cm');
    draw(gripChart, w.gripSeries, w.gripMarkCm, w.demandRatio, 1, 'table-grip');
    draw(cycleChart, w.cycleSeries, w.cycleTimeS, w.demandRatio, 2, 'table-cycle');
  };

  const club = byId('club');
  const pattern = byId('pattern');
  const grip = byId('grip');
  const tempo = byId('tempo');
  const error = byId('whatif-error');
  const outputs = () => {
    byId('grip-value').textContent = format(Number(grip.value), 1, 'cm');
    byId('tempo-value').textContent = format(Number(tempo.value), 2, 's');
  };
  const fitHandle = () => {
    const chosen = data.clubs.find((c) => c.id === club.value);
    if (chosen) {
      grip.max = String(chosen.handleLengthCm);
      if (Number(grip.value) > chosen.handleLengthCm) {
        grip.value = String(chosen.handleLengthCm);
      }
    }
  };

  let pending = null;
  let sequence = 0;
  const update = () => {
    const mine = ++sequence;
    const body = new URLSearchParams({
      club: club.value, pattern: pattern.value, gripCm: grip.value, cycleTimeS: tempo.value,
    });
    fetch(data.whatIfUrl, {
      method: 'POST',
      credentials: 'same-origin',
      headers: {
        'Content-Type': 'application/x-www-form-urlencoded',
        Accept: 'application/json',
        [form.dataset.csrfHeader]: form.dataset.csrfToken,
      },
      body,
    }).then((response) => {
      if (!response.ok) {
        throw new Error(String(response.status));
      }
      return response.json();
    }).then((w) => {
      if (mine === sequence) {
        error.classList.add('hidden');
        show(w);
      }
    }).catch(() => {
      error.textContent = labels.failed;
      error.classList.remove('hidden');
    });
  };
  const schedule = () => {
    outputs();
    clearTimeout(pending);
    pending = setTimeout(update, 150);
  };

  [grip, tempo].forEach((input) => input.addEventListener('input', schedule));
  club.addEventListener('change', () => { fitHandle(); schedule(); });
  pattern.addEventListener('change', schedule);
  form.querySelector('.what-if-submit').classList.add('hidden');
  form.addEventListener('submit', (event) => { event.preventDefault(); schedule(); });
  show(data.whatIf);
});
