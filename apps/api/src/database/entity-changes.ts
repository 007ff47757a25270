import {
  type DataSource,
  type EntitySubscriberInterface,
  type InsertEvent,
  type ObjectLiteral,
  type TransactionCommitEvent,
  type UpdateEvent,
} from 'typeorm';

/**
 * Counts the saves of one kind of entity by this API instance, for what is kept in
 * memory and read from those rows: the count moves when a row is inserted or updated and
 * again when that transaction commits. Whatever was read while the count moved may have
 * missed the change, so it is not kept.
 */
export class EntityChanges<
  Entity extends ObjectLiteral,
> implements EntitySubscriberInterface<Entity> {
  generation = 0;
  private readonly flag: string;

  constructor(
    dataSource: DataSource,
    private readonly entity: new () => Entity,
  ) {
    this.flag = `changed:${entity.name}`;
    dataSource.subscribers.push(this);
  }

  listenTo() {
    return this.entity;
  }

  afterInsert(event: InsertEvent<Entity>): void {
    this.changed(event);
  }

  afterUpdate(event: UpdateEvent<Entity>): void {
    this.changed(event);
  }

  afterTransactionCommit(event: TransactionCommitEvent): void {
    if (!event.queryRunner.data?.[this.flag]) return;
    event.queryRunner.data[this.flag] = false;
    this.generation += 1;
  }

  private changed(event: InsertEvent<Entity> | UpdateEvent<Entity>): void {
    this.generation += 1;
    event.queryRunner.data ??= {};
    event.queryRunner.data[this.flag] = true;
  }
}
