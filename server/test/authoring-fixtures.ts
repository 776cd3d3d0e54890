import request from 'supertest';
import type { Role } from '@mantlepiece/shared';
import { bearer, createPerson, signIn, type TestApp } from './test-app.js';

/** Authorization headers for a new person holding `role`. */
export async function signedInAs(t: TestApp, role: Role): Promise<Record<string, string>> {
  const person = await createPerson(t, { roles: [role] });
  return bearer((await signIn(t, person.email)).accessToken);
}

/** A venue, gallery and exhibit of their own, so each suite's lists hold only its rows. */
export async function galleryWithExhibit(t: TestApp, admin: Record<string, string>, label: string) {
  const slug = `${label}-${Math.random().toString(36).slice(2, 8)}`;
  const venue = await request(t.http).post('/api/venues').set(admin).send({ name: `${label} venue`, slug, sourceLocale: 'en', targetLocales: ['fr'] });
  if (venue.status !== 201) throw new Error(`venue: expected 201, got ${venue.status} ${JSON.stringify(venue.body)}`);
  const gallery = await request(t.http).post('/api/galleries').set(admin).send({ venueId: venue.body.id, name: `${label} gallery` });
  const exhibit = await request(t.http).post('/api/exhibits').set(admin).send({ galleryId: gallery.body.id, name: `${label} exhibit`, plannedStart: '2027-01-01', plannedEnd: '2027-12-31' });
  if (exhibit.status !== 201) throw new Error(`exhibit: expected 201, got ${exhibit.status} ${JSON.stringify(exhibit.body)}`);
  return { venue: venue.body, gallery: gallery.body, exhibit: exhibit.body };
}

export const paragraphDoc = (text: string) => ({ type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] });
