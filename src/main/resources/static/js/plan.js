// Plan pages: the demand line chart (Chart.js, from the JSON data block), copying the invitation link, printing.
// Everything here is an enhancement: the steps table carries the same values without JavaScript.
document.addEventListener('DOMContentLoaded', () => {
  document.querySelectorAll('[data-print]').forEach((button) => {
    button.addEventListener('click', () => window.print());
  });

  document.querySelectorAll('[data-copy]').forEach((button) => {
    button.addEventListener('click', () => {
      const field = document.getElementById(button.getAttribute('data-copy'));
      if (!field) {
        return;
      }
      field.select();
      if (navigator.clipboard) {
        navigator.clipboard.writeText(field.value).catch(() => document.execCommand('copy'));
      } else {
        document.execCommand('copy');
      }
    });
  });

  const canvas = document.getElementById('plan-chart');
  const block = document.getElementById('plan-chart-data');
  if (!canvas || !block || typeof Chart === 'undefined') {
    return;
  }
  const data = JSON.parse(block.textContent);
  const points = data.points || [];
  if (points.length === 0) {
    return;
  }
  const label = (name) => canvas.getAttribute('data-' + name) || '';
  const ink = '#1f2a33';
  const line = '#2f5d7c';
  const limit = '#9b1c1c';

  // The re-screen gate: a dashed vertical line between the last step within the band and the first provisional one.
  const gateLine = {
    id: 'planGate',
    afterDatasetsDraw(chart) {
      if (!data.gateStep || data.gateStep < 2) {
        return;
      }
      const x = chart.scales.x;
      const at = (x.getPixelForValue(data.gateStep - 2) + x.getPixelForValue(data.gateStep - 1)) / 2;
      const { top, bottom } = chart.chartArea;
      const ctx = chart.ctx;
      ctx.save();
      ctx.strokeStyle = ink;
      ctx.setLineDash([4, 5]);
      ctx.lineWidth = 1.5;
      ctx.beginPath();
      ctx.moveTo(at, top);
      ctx.lineTo(at, bottom);
      ctx.stroke();
      ctx.setLineDash([]);
      ctx.fillStyle = ink;
      ctx.font = '12px system-ui, sans-serif';
      ctx.fillText(label('gate-label'), at + 4, top + 12);
      ctx.restore();
    },
  };

  new Chart(canvas, {
    type: 'line',
    data: {
      labels: points.map((p) => p.step + ' (' + p.startsOn.substring(5) + ')'),
      datasets: [
        {
          label: label('series-label'),
          data: points.map((p) => p.d),
          borderColor: line,
          backgroundColor: points.map((p) => (p.provisional ? '#ffffff' : line)),
          pointBorderColor: line,
          pointRadius: 4,
          pointBorderWidth: 2,
          borderWidth: 2,
          segment: {
            borderDash: (ctx) => (points[ctx.p1DataIndex].provisional ? [6, 5] : undefined),
          },
        },
        {
          label: label('limit-label'),
          data: points.map(() => 1),
          borderColor: limit,
          borderDash: [8, 5],
          borderWidth: 1.5,
          pointRadius: 0,
          fill: false,
        },
      ],
    },
    options: {
      maintainAspectRatio: false,
      animation: false,
      interaction: { mode: 'index', intersect: false },
      scales: {
        y: { beginAtZero: true, suggestedMax: 1.2, title: { display: true, text: label('y-label') } },
        x: { title: { display: true, text: label('x-label') } },
      },
      plugins: {
        tooltip: {
          callbacks: {
            afterLabel: (item) => (item.datasetIndex === 0 && points[item.dataIndex].provisional
              ? label('provisional-label') : ''),
          },
        },
      },
    },
    plugins: [gateLine],
  });
});
