/**
 * Every server entry point × every role. The entry points are read from src/routes when the test
 * runs; TABLE below holds the one expected answer for each (entry point, role) cell. A new route
 * without a row fails ("add a row"), and so does a row whose route is gone.
 *
 * Requests are harmless by construction: JSON routes get an unreadable body (400 once past the
 * guard), form actions get a form no schema accepts, state moves go to a cancelled quote, and
 * deletes go to throwaway rows the suite makes per cell (`fresh`), checked afterwards.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BASE_URL } from './browser';
import { api, sessionCookie } from './http';
import {
	makeInventoryFixtures,
	makeThrowaway,
	removeThrowaways,
	rowExists,
	type InventoryFixtures,
	type ThrowawayKind
} from './proof/inventory';
import {
	describe as describeObserved,
	matches,
	type Expected,
	type Observed
} from './proof/outcome';
import { EMAILS, ROLES, signInEveryone, type Role, type Sessions } from './proof/people';
import { makeQuoteFixtures, type QuoteFixtures } from './proof/quotes';
import { endpoint, formAction, loadAlone, pageHtml } from './proof/requests';
import { discoverEntryPoints, type EntryPoint } from './proof/routes';

interface RowOptions {
	/** Each cell acts on a new throwaway row of this kind (for deletes); afterwards it must be gone only if allowed. */
	fresh?: ThrowawayKind;
	/** Use the cancelled quote for `[id=id]`: no state move is legal on it, so actions change nothing. */
	quote?: 'cancelled';
	/** The form an action receives (default: a field no schema knows). */
	form?: Record<string, string>;
	/** A JSON body for the endpoint instead of the unreadable one. */
	json?: unknown;
}
type Row = Record<Role, Expected> & RowOptions;

const S = 'signin';
const D = 'denied';

// prettier-ignore
const TABLE: Record<string, Row> = {
	// ---- JSON and file API: signed out is 401 --------------------------------------------------------
	'GET /api/health':                           { out: 'ok', admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'POST /api/webhooks/stripe':                 { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 }, // the signature is the authentication
	'GET /api/users':                            { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'POST /api/users':                           { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },
	'PATCH /api/users/[id=id]':                  { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },
	'POST /api/evaluations':                     { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'POST /api/suggestions':                     { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },

	'GET /api/sites':                            { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/sites':                           { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'GET /api/sites/[id=id]':                    { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PUT /api/sites/[id=id]':                    { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'PATCH /api/sites/[id=id]':                  { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'DELETE /api/sites/[id=id]':                 { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: D, stranger: D, fresh: 'site' },

	'GET /api/loudspeakers':                     { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/loudspeakers':                    { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/loudspeakers.csv':                 { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/loudspeakers/import':             { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/loudspeakers/[id=id]':             { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PATCH /api/loudspeakers/[id=id]':           { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'DELETE /api/loudspeakers/[id=id]':          { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'loudspeaker' },
	'GET /api/loudspeakers/[id=id]/attachments': { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/loudspeakers/[id=id]/attachments':{ out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/loudspeakers/[id=id]/history':     { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'GET /api/loudspeakers/[id=id]/directivity.csv':  { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/loudspeakers/[id=id]/directivity.csv': { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },

	'GET /api/amplifiers':                       { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/amplifiers':                      { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/amplifiers.csv':                   { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/amplifiers/import':               { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/amplifiers/[id=id]':               { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PATCH /api/amplifiers/[id=id]':             { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'DELETE /api/amplifiers/[id=id]':            { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'amplifier' },
	'GET /api/amplifiers/[id=id]/attachments':   { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/amplifiers/[id=id]/attachments':  { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/amplifiers/[id=id]/history':       { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },

	'GET /api/attachments/[id=id]':              { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'DELETE /api/attachments/[id=id]':           { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'attachment' },

	'GET /api/packages':                         { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/packages':                        { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/packages/[id=id]':                 { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PATCH /api/packages/[id=id]':               { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'DELETE /api/packages/[id=id]':              { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'package' },
	'GET /api/packages/[id=id]/history':         { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },

	'GET /api/stock-units':                      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/stock-units':                     { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/stock-units/[id=id]':              { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PATCH /api/stock-units/[id=id]':            { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'DELETE /api/stock-units/[id=id]':           { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'unit' },
	'GET /api/stock-units/[id=id]/history':      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },

	'GET /api/quotes':                           { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'ok' }, // a client lists only their own
	'POST /api/quotes':                          { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'GET /api/quotes/[id=id]':                   { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'missing' },
	'PATCH /api/quotes/[id=id]':                 { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	// A real move ("accept") on the cancelled quote: 409 for those who may try, 404 for another client.
	'POST /api/quotes/[id=id]/package':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D, quote: 'cancelled' },
	'POST /api/quotes/[id=id]/actions':          { out: S, admin: 409, warehouse: D, sales: 409, client: 409, stranger: 'missing', quote: 'cancelled', json: { action: 'accept' } },
	'GET /api/quotes/[id=id]/document':         { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'missing' }, // the PDF: staff and the owning client
	'GET /api/company-logo':                     { out: S, admin: 'missing', warehouse: D, sales: 'missing', client: 'missing', stranger: 'missing' }, // no logo in the test world
	'GET /api/clients':                          { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/clients':                         { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'GET /api/clients/[id=id]':                  { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'PATCH /api/clients/[id=id]':                { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	// Getting back in is open to everyone; an unreadable body is 400 before anything is looked up.
	'POST /api/sign-in-links':                   { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 },
	'POST /api/password-resets':                 { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 },
	'POST /api/quotes/[id=id]/balance-invoice':  { out: S, admin: 409, warehouse: D, sales: 409, client: D, stranger: D }, // the sent quote is not confirmed

	'GET /api/bookings':                         { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' }, // a client lists only their own
	'GET /api/bookings/[id=id]':                 { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'missing' }, // the client sees the state only
	'POST /api/bookings/[id=id]/dispatch':       { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'POST /api/bookings/[id=id]/return':         { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/stock-units/[id=id]/repairs':      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'POST /api/stock-units/[id=id]/repairs':     { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'GET /api/availability':                     { out: S, admin: 422, warehouse: 422, sales: 422, client: D, stranger: D }, // from and to are required
	'GET /api/damage-reports/[id=id]/photo':     { out: S, admin: 'allowed', warehouse: 'allowed', sales: 'allowed', client: D, stranger: D }, // 404 unless that report has a photo

	// ---- Pages: signed out goes to sign-in ------------------------------------------------------------
	'layout /':                                  { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'load /':                                    { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'load /signin':                              { out: 'ok', admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' }, // signed in: on to /
	'action /signin?/default':                   { out: 'allowed', admin: 'allowed', warehouse: 'allowed', sales: 'allowed', client: 'allowed', stranger: 'allowed' },
	// The one-time link is its own authentication: open to all; an unknown token is 410 Gone.
	'load /signin/link/[token]':                 { out: 'ok', admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'action /signin/link/[token]?/default':      { out: 410, admin: 410, warehouse: 410, sales: 410, client: 410, stranger: 410 },
	'load /signin/help':                         { out: 'ok', admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'action /signin/help?/link':                 { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 }, // no valid e-mail in the form
	'action /signin/help?/reset':                { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 },
	'load /signin/reset/[token]':              { out: 'ok', admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'action /signin/reset/[token]?/default':   { out: 400, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 },
	'load /account':                             { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'action /account?/password':                 { out: S, admin: 400, warehouse: 400, sales: 400, client: 400, stranger: 400 },
	'load /signout':                             { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: 'ok', stranger: 'ok' },
	'action /signout?/default':                  { out: S, admin: S, warehouse: S, sales: S, client: S, stranger: S }, // signing out lands on sign-in

	'load /admin/users':                         { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/users?/create':               { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/users?/update':               { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/users?/sendReset':            { out: S, admin: 400, warehouse: D, sales: D, client: D, stranger: D }, // the form names nobody
	'load /admin/settings/logo':                 { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/settings/logo?/upload':       { out: S, admin: 422, warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/settings/logo?/remove':       { out: S, admin: 409, warehouse: D, sales: D, client: D, stranger: D }, // no logo to remove
	'load /clients':                             { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /clients?/create':                   { out: S, admin: 400, warehouse: D, sales: 400, client: D, stranger: D },
	'load /clients/[id=id]':                     { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /clients/[id=id]?/save':             { out: S, admin: 400, warehouse: D, sales: 400, client: D, stranger: D },
	'action /clients/[id=id]?/addContact':       { out: S, admin: 400, warehouse: D, sales: 400, client: D, stranger: D },
	'action /clients/[id=id]?/updateContact':    { out: S, admin: 400, warehouse: D, sales: 400, client: D, stranger: D },
	'load /admin/settings':                      { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/settings?/default':           { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },
	'load /admin/programmes':                    { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'load /admin/programmes/[slug]':             { out: S, admin: 'ok', warehouse: D, sales: D, client: D, stranger: D },
	'action /admin/programmes/[slug]?/default':  { out: S, admin: 'allowed', warehouse: D, sales: D, client: D, stranger: D },

	'load /bookings':                            { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /bookings/[id=id]':                    { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	// An empty choice would be valid (it clears the assignment), so the form carries a unit id that cannot be read.
	'action /bookings/[id=id]?/assign':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D, form: { unit: 'not-a-unit' } },
	'action /bookings/[id=id]?/dispatch':        { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /bookings/[id=id]?/return':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /bookings/[id=id]?/damage':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	// The suite's booking is confirmed: closing it is refused (409) past the guard.
	'action /bookings/[id=id]?/close':           { out: S, admin: 409, warehouse: 409, sales: D, client: D, stranger: D },
	// An empty address would be valid, so the form carries one too long to accept.
	'action /bookings/[id=id]?/address':         { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D, form: { siteAddress: 'x'.repeat(301) } },
	'load /bookings/[id=id]/delivery-note':      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /bookings/availability':               { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /bookings/tests':                      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /bookings/tests?/tested':            { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /bookings/tests?/interval':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /bookings/repairs':                    { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /bookings/repairs?/repair':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /bookings/labels':                     { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /bookings/labels/print':               { out: S, admin: 400, warehouse: 400, sales: 400, client: D, stranger: D }, // names neither a model nor a booking

	// A preview of the site plan (sites:read); the sites pages may replace it.
	'load /sites/plan-preview':                  { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },

	'layout /inventory':                         { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /inventory':                           { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D }, // on to the loudspeakers
	'load /inventory/import':                    { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/import?/preview':         { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/import?/apply':           { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },

	'load /inventory/loudspeakers':              { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /inventory/loudspeakers/new':          { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/loudspeakers/new?/default':{ out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /inventory/loudspeakers/[id=id]':      { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /inventory/loudspeakers/[id=id]?/upload':          { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/loudspeakers/[id=id]?/removeAttachment':{ out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/loudspeakers/[id=id]?/delete':          { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'loudspeaker' },
	'load /inventory/loudspeakers/[id=id]/edit': { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/loudspeakers/[id=id]/edit?/default':    { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },

	'load /inventory/amplifiers':                { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /inventory/amplifiers/new':            { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/amplifiers/new?/default': { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /inventory/amplifiers/[id=id]':        { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /inventory/amplifiers/[id=id]?/upload':            { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/amplifiers/[id=id]?/removeAttachment':  { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/amplifiers/[id=id]?/delete':            { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'amplifier' },
	'load /inventory/amplifiers/[id=id]/edit':   { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/amplifiers/[id=id]/edit?/default':      { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },

	'load /inventory/packages':                  { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /inventory/packages?/promote':       { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D }, // the form names no quote: 422
	'load /inventory/packages/new':              { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/packages/new?/default':   { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /inventory/packages/[id=id]':          { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /inventory/packages/[id=id]?/delete':{ out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'package' },
	'load /inventory/packages/[id=id]/edit':     { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/packages/[id=id]/edit?/default':        { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },

	'load /inventory/units':                     { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /inventory/units/new':                 { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D },
	'action /inventory/units/new?/default':      { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'load /inventory/units/[id=id]':             { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /inventory/units/[id=id]?/save':     { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D },
	'action /inventory/units/[id=id]?/delete':   { out: S, admin: 'ok', warehouse: 'ok', sales: D, client: D, stranger: D, fresh: 'unit' },

	'load /sites':                               { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'load /sites/new':                           { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: D, stranger: D },
	'action /sites/new?/default':                { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'load /sites/[id=id]':                       { out: S, admin: 'ok', warehouse: 'ok', sales: 'ok', client: D, stranger: D },
	'action /sites/[id=id]?/save':               { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'action /sites/[id=id]?/delete':             { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: D, stranger: D, fresh: 'site' },

	'load /quotes':                              { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'ok' },
	'load /quotes/new':                          { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: D, stranger: D },
	'action /quotes/new?/save':                  { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	'load /quotes/[id=id]':                      { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'missing' },
	'load /quotes/[id=id]/print':                { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: 'ok', stranger: 'missing' },
	'load /quotes/[id=id]/edit':                 { out: S, admin: 'ok', warehouse: D, sales: 'ok', client: D, stranger: D },
	'action /quotes/[id=id]/edit?/save':         { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D },
	// State moves on the cancelled quote: none is legal (409), so only the guard's answer differs.
	'action /quotes/[id=id]?/send':              { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D, quote: 'cancelled' },
	'action /quotes/[id=id]?/accept':            { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: 'allowed', stranger: 'missing', quote: 'cancelled' },
	'action /quotes/[id=id]?/decline':           { out: S, admin: D, warehouse: D, sales: D, client: 409, stranger: 'missing', quote: 'cancelled' },
	'action /quotes/[id=id]?/requestChange':     { out: S, admin: D, warehouse: D, sales: D, client: 409, stranger: 'missing', quote: 'cancelled' },
	'action /quotes/[id=id]?/cancel':            { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D, quote: 'cancelled' },
	'action /quotes/[id=id]?/close':             { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D, quote: 'cancelled' },
	'action /quotes/[id=id]?/promote':           { out: S, admin: 'allowed', warehouse: 'allowed', sales: D, client: D, stranger: D, quote: 'cancelled' }, // the form names no package: 422
	'action /quotes/[id=id]?/balanceInvoice':    { out: S, admin: 'allowed', warehouse: D, sales: 'allowed', client: D, stranger: D, quote: 'cancelled' }
};

/** Well-formed (so it reaches the lookup) but issued to nobody. */
const UNKNOWN_LINK_TOKEN = 'proof-suite-unknown-link-token';

type Ids = InventoryFixtures & QuoteFixtures & { userId: number; clientId: number; programmeSlug: string; siteId: number };

let sessions: Sessions;
let ids: Ids;
const throwaways: { kind: ThrowawayKind; id: number }[] = [];

/** The row an `[id=id]` fills, by the collection segment before it. */
function idFor(collection: string, row: Row): number {
	const byCollection: Record<string, number> = {
		loudspeakers: ids.speakerId,
		amplifiers: ids.ampId,
		packages: ids.packageId,
		units: ids.unitId,
		'stock-units': ids.unitId,
		attachments: ids.attachmentId,
		bookings: ids.bookingId,
		'damage-reports': ids.unitId,
		users: ids.userId,
		clients: ids.clientId,
		sites: ids.siteId,
		quotes: row.quote === 'cancelled' ? ids.cancelledQuoteId : ids.sentQuoteId
	};
	const id = byCollection[collection];
	if (!id)
		throw new Error(
			`the matrix does not know how to fill [id=id] after /${collection}/: teach idFor`
		);
	return id;
}

function urlFor(route: string, row: Row, freshId?: number): string {
	const segments = route.split('/');
	return segments
		.map((segment, i) => {
			if (segment === '[id=id]') return String(freshId ?? idFor(segments[i - 1], row));
			if (segment === '[slug]') return ids.programmeSlug;
			if (segment === '[token]') return UNKNOWN_LINK_TOKEN;
			if (segment.startsWith('['))
				throw new Error(`the matrix does not know how to fill ${segment} in ${route}`);
			return segment;
		})
		.join('/');
}

/** A first programme profile's slug, read from the admin's list of them. */
async function programmeSlug(): Promise<string> {
	const html = await (
		await fetch(`${BASE_URL}/admin/programmes`, {
			headers: { cookie: sessions.admin ?? '', accept: 'text/html' }
		})
	).text();
	const slug = [...html.matchAll(/href="\/admin\/programmes\/([a-z0-9-]+)"/g)]
		.map((m) => m[1])
		.find((s) => s !== 'new');
	if (!slug) throw new Error('no programme profile listed');
	return slug;
}

beforeAll(async () => {
	sessions = await signInEveryone();
	const inventory = await makeInventoryFixtures(sessions.admin!);
	const quotes = await makeQuoteFixtures(sessions);
	const users = await api('/api/users', { cookie: sessions.admin });
	const site = await api('/api/sites', { cookie: sessions.admin, method: 'POST', body: { name: 'Proof matrix site', receivers: [] } });
	ids = {
		...inventory,
		...quotes,
		userId: (users.json as { id: number }[])[0].id,
		clientId: (users.json as { clientId: number | null }[]).find((u) => u.clientId !== null)!.clientId!,
		programmeSlug: await programmeSlug(),
		siteId: (site.json as { id: number }).id
	};
}, 120_000);

afterAll(async () => {
	if (sessions?.admin) await removeThrowaways(throwaways, sessions.admin);
});

function isMutation(entry: EntryPoint): boolean {
	return entry.kind === 'action' || (entry.kind === 'endpoint' && entry.method !== 'GET');
}

/** Asks one cell's question; loads are asked twice (the page as a person gets it, and the load alone). */
async function observe(
	entry: EntryPoint,
	row: Row,
	role: Role,
	freshId?: number
): Promise<{ how: string; seen: Observed }[]> {
	const cookie = sessions[role];
	const url = urlFor(entry.route, row, freshId);
	switch (entry.kind) {
		case 'endpoint':
			return [
				{
					how: entry.method,
					seen: await endpoint(
						entry,
						url,
						cookie,
						row.json === undefined ? undefined : JSON.stringify(row.json)
					)
				}
			];
		case 'action': {
			const seen = await formAction(url, entry.action!, row.form ?? { proofMatrix: 'not a field' }, cookie);
			// Signing out ends every session of that person: the rest of the matrix needs a new one.
			if (entry.route === '/signout' && role !== 'out') sessions[role] = await sessionCookie(EMAILS[role]);
			return [{ how: 'action', seen }];
		}
		case 'load':
			return [
				{ how: 'page', seen: await pageHtml(url, cookie) },
				{ how: 'load alone', seen: await loadAlone(url, entry.nodeIndex!, cookie) }
			];
		case 'layout':
			return [
				{
					how: 'layout load alone',
					seen: await loadAlone(urlFor(entry.pageRoute!, row), entry.nodeIndex!, cookie)
				}
			];
	}
}

describe('route matrix: every server entry point × every role', () => {
	const entries = discoverEntryPoints();

	it('has exactly one row per entry point found in src/routes', () => {
		const found = new Set(entries.map((e) => e.key));
		const missingRows = [...found].filter((k) => !(k in TABLE)).map((k) => `add a row for ${k}`);
		const staleRows = Object.keys(TABLE)
			.filter((k) => !found.has(k))
			.map((k) => `no entry point for the row ${k}: remove or rename it`);
		expect([...missingRows, ...staleRows]).toEqual([]);
	});

	it('answers every cell as the table says', async () => {
		const wrong: string[] = [];
		let requests = 0;
		for (const entry of entries) {
			const row = TABLE[entry.key];
			if (!row) continue; // reported by the test above
			for (const role of ROLES) {
				const expected = row[role];
				const freshId = row.fresh
					? await makeThrowaway(row.fresh, sessions.admin!, ids)
					: undefined;
				if (row.fresh && freshId) throwaways.push({ kind: row.fresh, id: freshId });
				for (const { how, seen } of await observe(entry, row, role, freshId)) {
					requests++;
					const cell = `${entry.key} as ${role} (${how})`;
					if (!matches(expected, seen))
						wrong.push(
							`${cell}: wanted ${expected}, got ${describeObserved(seen)} ${seen.detail}`.trim()
						);
					// Only throwaway rows may really change: everything else must be refused once past the guard.
					if (isMutation(entry) && !row.fresh && matches('ok', seen))
						wrong.push(`${cell}: changed something (${describeObserved(seen)})`);
				}
				if (row.fresh && freshId) {
					const exists = await rowExists(row.fresh, freshId, sessions.admin!);
					if (expected === 'ok' && exists)
						wrong.push(
							`${entry.key} as ${role}: answered as allowed but the ${row.fresh} is still there`
						);
					if (expected !== 'ok' && !exists)
						wrong.push(`${entry.key} as ${role}: refused, yet the ${row.fresh} is gone`);
				}
			}
		}
		const cells = entries.length * ROLES.length;
		console.log(
			`route matrix: ${entries.length} entry points × ${ROLES.length} roles = ${cells} cells (${requests} requests)`
		);
		expect(wrong).toEqual([]);
	}, 300_000);
});
