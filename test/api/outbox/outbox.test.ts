// The admins' outbox lists what the fake mail server caught, attachments included, and refuses names outside its folder.
import { expect } from 'chai';
import { resetDatabase } from '../../support/test-database.js';
import { clearCaughtMail } from '../../support/mail-catcher.js';
import { signInAs, testContext } from '../../support/test-app.js';

describe('outbox', () => {
  beforeEach(async () => {
    await resetDatabase();
    clearCaughtMail();
  });

  it('shows a message sent through the mailer, with its attachment downloadable', async () => {
    const sent = await testContext().mailer.send({
      to: ['orders@supplier.example'],
      subject: 'Test order',
      text: 'Two packs, please.',
      attachments: [{ filename: 'order.txt', content: Buffer.from('packs: 2'), contentType: 'text/plain' }],
    });
    expect(sent).to.equal(true);
    const { agent } = await signInAs(['admin']);
    const list = await agent.get('/api/outbox').expect(200);
    expect(list.body.items).to.have.length(1);
    const [message] = list.body.items;
    expect(message).to.include({ subject: 'Test order', to: 'orders@supplier.example' });
    expect(message.text.trim()).to.equal('Two packs, please.');
    expect(message.attachments[0]).to.include({ filename: 'order.txt' });
    const attachment = await agent.get(`/api/outbox/${message.id}/attachments/0`).expect(200);
    expect(attachment.text).to.equal('packs: 2');
  });

  it('answers 404 for a name that tries to leave the folder', async () => {
    const { agent } = await signInAs(['admin']);
    expect((await agent.get('/api/outbox/..%2F..%2Fpackage.json')).status).to.equal(404);
    expect((await agent.get('/api/outbox/nope.eml')).status).to.equal(404);
  });
});
