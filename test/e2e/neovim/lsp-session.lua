-- A session of Neovim's built-in LSP client (Neovim 0.7) with the Wedgework language server, run
-- headless by ../neovim.e2e.ts. It opens two files, waits for the server's diagnostics, asks for a
-- hover and for code lenses, and writes everything the server answered to a JSON report; the
-- TypeScript side checks the report. Inputs come from the environment:
--   WEDGEWORK_SERVER   the bundled server (dist/server.cjs), started as `node SERVER --stdio`
--   WEDGEWORK_SAMPLE   the sample to open;  WEDGEWORK_BROKEN  the file with a syntax error
--   WEDGEWORK_HOVER_LINE, WEDGEWORK_HOVER_CHARACTER  zero-based position to hover in the sample
--   WEDGEWORK_REPORT   where to write the report
local env = function(name)
  local value = os.getenv(name)
  if value == nil or value == '' then
    io.stderr:write('lsp-session.lua: ' .. name .. ' is not set\n')
    vim.cmd('cquit 2')
  end
  return value
end

local server = env('WEDGEWORK_SERVER')
local report_path = env('WEDGEWORK_REPORT')
local TIMEOUT_MS = 30000
local report = { problems = {} }

local function note_problem(text)
  table.insert(report.problems, text)
end

local client_id = vim.lsp.start_client({
  name = 'wedgework',
  cmd = { 'node', server, '--stdio' },
  root_dir = vim.fn.fnamemodify(env('WEDGEWORK_SAMPLE'), ':h'),
  on_exit = function(code, signal)
    if code ~= 0 and not report.stopping then
      note_problem('the server exited with code ' .. tostring(code) .. ', signal ' .. tostring(signal))
    end
  end,
})
if not client_id then
  note_problem('vim.lsp.start_client could not start the server')
end

-- Opens a file in a buffer of the `wedge` filetype (the languageId sent) and attaches the client.
local function open(path)
  vim.cmd('edit ' .. vim.fn.fnameescape(path))
  local bufnr = vim.api.nvim_get_current_buf()
  vim.bo[bufnr].filetype = 'wedge'
  vim.lsp.buf_attach_client(bufnr, client_id)
  return bufnr
end

-- Waits (polling every 50 ms, at most TIMEOUT_MS) for the server's diagnostics of the buffer.
local function diagnostics_of(bufnr, what)
  local arrived = vim.wait(TIMEOUT_MS, function()
    return #vim.diagnostic.get(bufnr) > 0
  end, 50)
  if not arrived then
    note_problem('no diagnostics for ' .. what .. ' within ' .. TIMEOUT_MS .. ' ms')
  end
  local result = {}
  for _, d in ipairs(vim.diagnostic.get(bufnr)) do
    local lsp = (d.user_data or {}).lsp or {}
    table.insert(result, {
      line = d.lnum,
      character = d.col,
      severity = d.severity,
      source = d.source,
      code = d.code or lsp.code,
      message = d.message,
    })
  end
  return result
end

-- One request and its answer from our client (nil and a noted problem when there is none).
local function request(bufnr, method, params, what)
  local answers, err = vim.lsp.buf_request_sync(bufnr, method, params, TIMEOUT_MS)
  if not answers then
    note_problem(what .. ': ' .. method .. ' failed: ' .. tostring(err))
    return nil
  end
  local answer = answers[client_id]
  if not answer then
    note_problem(what .. ': no answer from the client to ' .. method)
    return nil
  end
  if answer.err or answer.error then
    note_problem(what .. ': ' .. method .. ' answered an error: ' .. vim.inspect(answer.err or answer.error))
  end
  return answer.result
end

local function lens_summary(lenses)
  local result = {}
  for _, lens in ipairs(lenses or {}) do
    local command = lens.command or {}
    table.insert(result, {
      line = lens.range.start.line,
      title = command.title,
      command = command.command,
      arguments = command.arguments,
    })
  end
  return result
end

if client_id then
  local sample = open(env('WEDGEWORK_SAMPLE'))
  local uri = vim.uri_from_bufnr(sample)
  report.sample = { diagnostics = diagnostics_of(sample, 'the sample') }
  local position = { line = tonumber(env('WEDGEWORK_HOVER_LINE')), character = tonumber(env('WEDGEWORK_HOVER_CHARACTER')) }
  local hover = request(sample, 'textDocument/hover', { textDocument = { uri = uri }, position = position }, 'the sample')
  report.sample.hover = hover and hover.contents or vim.NIL
  report.sample.lenses = lens_summary(request(sample, 'textDocument/codeLens', { textDocument = { uri = uri } }, 'the sample'))

  local broken = open(env('WEDGEWORK_BROKEN'))
  report.broken = { diagnostics = diagnostics_of(broken, 'the broken file') }
  report.broken.lenses = lens_summary(
    request(broken, 'textDocument/codeLens', { textDocument = { uri = vim.uri_from_bufnr(broken) } }, 'the broken file')
  )
end

local file = io.open(report_path, 'w')
file:write(vim.fn.json_encode(report))
file:close()

if client_id then
  report.stopping = true
  vim.lsp.stop_client(client_id)
  vim.wait(5000, function()
    return vim.lsp.get_client_by_id(client_id) == nil
  end, 50)
end
vim.cmd('qall!')
