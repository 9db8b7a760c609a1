/**
 * The review page's only script: filtering by level and by rule, with no server. Every flag carries
 * `data-level` and `data-rule`; a claim shows while one of its flags does (a claim without flags
 * shows while "claims without flags" is ticked); a file shows while one of its claims does. The
 * count of flags shown is announced to screen readers. Without the script everything is shown.
 */
export const PAGE_SCRIPT = `
(function () {
  var form = document.getElementById('filters');
  if (!form) return;
  form.hidden = false;
  function apply() {
    var levels = {};
    form.querySelectorAll('input[name=level]').forEach(function (box) { levels[box.value] = box.checked; });
    var rule = form.querySelector('select[name=rule]').value;
    var shown = 0;
    document.querySelectorAll('.claim').forEach(function (claim) {
      var flags = claim.querySelectorAll('.flag');
      var visible = 0;
      flags.forEach(function (flag) {
        var show = levels[flag.dataset.level] === true && (rule === '' || flag.dataset.rule === rule);
        flag.hidden = !show;
        if (show) visible += 1;
      });
      shown += visible;
      claim.hidden = flags.length === 0 ? !(levels.none === true && rule === '') : visible === 0;
    });
    document.querySelectorAll('section.file').forEach(function (section) {
      section.hidden = section.querySelectorAll('.claim:not([hidden])').length === 0;
    });
    document.getElementById('shown').textContent = 'Showing ' + shown + ' of ' + form.dataset.total + ' flags';
  }
  form.addEventListener('change', apply);
  apply();
})();
`;
